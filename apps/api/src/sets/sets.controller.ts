import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Interchange, Page, Proposal, SessionUser, SetDetail, SetRow, Stock } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { InterchangeService } from './interchange.service';
import { AllocateSetsDto, PartNumberDto, ProposalRequestDto, SetIdDto, SetListQueryDto } from './sets.dto';
import { SetsService } from './sets.service';

const READERS = ['sales', 'service', 'engineer', 'admin'] as const;

@ApiTags('sets')
@Controller('sets')
@Roles('sales', 'admin')
export class SetsController {
  constructor(private readonly sets: SetsService) {}

  @Get()
  @Roles(...READERS)
  list(@Query() query: SetListQueryDto): Promise<Page<SetRow>> {
    return this.sets.list(query);
  }

  /** What each part number's free stock can make. */
  @Get('stock')
  stock(): Promise<Stock[]> {
    return this.sets.stockByPartNumber();
  }

  /** Sets the free stock can make, chosen by the system; saves nothing. */
  @Post('proposal')
  @HttpCode(200)
  propose(@Body() body: ProposalRequestDto): Promise<Proposal> {
    return this.sets.propose(body);
  }

  /** Allocates the sets to the customer's order, all or nothing. */
  @Post()
  allocate(@CurrentUser() actor: SessionUser, @Body() body: AllocateSetsDto): Promise<{ items: SetRow[] }> {
    return this.sets.allocate(actor, body);
  }

  @Get(':id')
  @Roles(...READERS)
  detail(@Param() { id }: SetIdDto): Promise<SetDetail> {
    return this.sets.detail(id);
  }
}

@ApiTags('sets')
@Controller('interchange')
@Roles(...READERS)
export class InterchangeController {
  constructor(private readonly interchange: InterchangeService) {}

  /** The heights a new part may have and still match every set sold before. */
  @Get(':partNumber')
  window(@Param() { partNumber }: PartNumberDto): Promise<Interchange> {
    return this.interchange.view(partNumber);
  }
}
