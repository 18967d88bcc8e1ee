import { Body, Controller, Get, Param, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { GrindRequestDetail, GrindRequestRow, Page, SessionUser } from '@evenset/contracts';
import { ANY_ROLE, Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { GrindRequestsService } from './grind-requests.service';
import {
  CreateGrindRequestDto,
  GrindRequestIdDto,
  GrindRequestListQueryDto,
  GrindRequestStepDto,
} from './replacements.dto';

@ApiTags('grind requests')
@Controller('grind-requests')
@Roles(...ANY_ROLE)
export class GrindRequestsController {
  constructor(private readonly requests: GrindRequestsService) {}

  @Get()
  list(@Query() query: GrindRequestListQueryDto): Promise<Page<GrindRequestRow>> {
    return this.requests.list(query);
  }

  /** Grind a released part above a sold set's window down to the window's centre. */
  @Post()
  @Roles('service', 'engineer')
  create(@CurrentUser() actor: SessionUser, @Body() body: CreateGrindRequestDto): Promise<GrindRequestDetail> {
    return this.requests.create(actor, body);
  }

  /** The request with its pass table, the grinding cautions, its steps and any re-inspection. */
  @Get(':id')
  detail(@Param() { id }: GrindRequestIdDto): Promise<GrindRequestDetail> {
    return this.requests.detail(id);
  }

  /** Marks an open request as ground. */
  @Post(':id/steps')
  @Roles('engineer', 'inspector', 'service')
  step(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: GrindRequestIdDto,
    @Body() body: GrindRequestStepDto,
  ): Promise<GrindRequestDetail> {
    return this.requests.step(actor, id, body);
  }
}
