import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Lot as LotView, LotDetail, Page, PartRow, SerialPreview, SessionUser } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import {
  CreateLotDto,
  CreatePartsDto,
  LotIdDto,
  LotListQueryDto,
  PartListQueryDto,
  SerialPatternDto,
} from './lots.dto';
import { LotsService } from './lots.service';

@ApiTags('lots')
@Controller('lots')
@Roles('engineer')
export class LotsController {
  constructor(private readonly lots: LotsService) {}

  @Get()
  @Roles('engineer', 'inspector')
  list(@Query() query: LotListQueryDto): Promise<Page<LotView>> {
    return this.lots.list(query);
  }

  @Post()
  create(@CurrentUser() actor: SessionUser, @Body() body: CreateLotDto): Promise<LotView> {
    return this.lots.create(actor, body);
  }

  /** The lot, its spec, counts by status and the spread of its heights. */
  @Get(':id')
  @Roles('engineer', 'inspector')
  detail(@Param() { id }: LotIdDto): Promise<LotDetail> {
    return this.lots.detail(id);
  }

  @Get(':id/parts')
  @Roles('engineer', 'inspector')
  parts(@Param() { id }: LotIdDto, @Query() query: PartListQueryDto): Promise<Page<PartRow>> {
    return this.lots.parts(id, query);
  }

  /** The serials a pattern would make, and those already taken; saves nothing. */
  @Post(':id/parts/preview')
  @HttpCode(200)
  previewSerials(@Param() { id }: LotIdDto, @Body() body: SerialPatternDto): Promise<SerialPreview> {
    return this.lots.previewSerials(id, body);
  }

  @Post(':id/parts')
  createParts(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: LotIdDto,
    @Body() body: CreatePartsDto,
  ): Promise<{ items: PartRow[] }> {
    return this.lots.createParts(actor, id, body);
  }
}
