import { Body, Controller, Get, HttpCode, Param, Post, Put, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Instrument as InstrumentView, Page, SessionUser } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { InstrumentIdDto, InstrumentInputDto, InstrumentListQueryDto, RetireInstrumentDto } from './instruments.dto';
import { InstrumentsService } from './instruments.service';

@ApiTags('instruments')
@Controller('instruments')
@Roles('engineer')
export class InstrumentsController {
  constructor(private readonly instruments: InstrumentsService) {}

  /** `?usable=true`: only instruments that may be used at the Bench (not overdue, not retired). */
  @Get()
  @Roles('engineer', 'inspector')
  list(@Query() query: InstrumentListQueryDto): Promise<Page<InstrumentView>> {
    return this.instruments.list(query);
  }

  @Get(':id')
  @Roles('engineer', 'inspector')
  view(@Param() { id }: InstrumentIdDto): Promise<InstrumentView> {
    return this.instruments.view(id);
  }

  @Post()
  create(@CurrentUser() actor: SessionUser, @Body() body: InstrumentInputDto): Promise<InstrumentView> {
    return this.instruments.create(actor, body);
  }

  @Put(':id')
  update(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: InstrumentIdDto,
    @Body() body: InstrumentInputDto,
  ): Promise<InstrumentView> {
    return this.instruments.update(actor, id, body);
  }

  @Post(':id/retire')
  @HttpCode(200)
  retire(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: InstrumentIdDto,
    @Body() body: RetireInstrumentDto,
  ): Promise<InstrumentView> {
    return this.instruments.retire(actor, id, body.reason);
  }
}
