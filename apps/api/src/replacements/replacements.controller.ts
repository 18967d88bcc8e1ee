import { Body, Controller, Get, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { AllocatedReplacement, ReplacementLookup, SessionUser } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { AllocateReplacementDto, ReplacementLookupQueryDto } from './replacements.dto';
import { ReplacementsService } from './replacements.service';

@ApiTags('replacements')
@Controller('replacements')
@Roles('service', 'sales')
export class ReplacementsController {
  constructor(private readonly replacements: ReplacementsService) {}

  /** The original set behind a certificate number or serial, its window, fitting and grindable parts. */
  @Get('lookup')
  @Roles('service', 'sales', 'engineer', 'admin')
  lookup(@Query() { q }: ReplacementLookupQueryDto): Promise<ReplacementLookup> {
    return this.replacements.lookup(q);
  }

  /** Allocates a fitting part as a replacement set for the customer's order. */
  @Post()
  allocate(@CurrentUser() actor: SessionUser, @Body() body: AllocateReplacementDto): Promise<AllocatedReplacement> {
    return this.replacements.allocate(actor, body);
  }
}
