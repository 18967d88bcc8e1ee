import { Controller, Get, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { AuditEntry, AuditFacets, Page } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { AuditListQueryDto } from './audit.dto';
import { AuditLogService } from './audit-log.service';

@ApiTags('audit log')
@Controller('audit')
@Roles('engineer', 'admin')
export class AuditController {
  constructor(private readonly log: AuditLogService) {}

  @Get()
  list(@Query() query: AuditListQueryDto): Promise<Page<AuditEntry>> {
    return this.log.list(query);
  }

  @Get('facets')
  facets(): Promise<AuditFacets> {
    return this.log.facets();
  }
}
