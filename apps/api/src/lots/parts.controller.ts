import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Disposition, PartDetail, SessionUser } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { DispositionDto, PartIdDto, ReleaseDto } from './lots.dto';
import { PartsService } from './parts.service';

@ApiTags('parts')
@Controller('parts')
@Roles('engineer')
export class PartsController {
  constructor(private readonly parts: PartsService) {}

  /** Every inspection of the part, newest first, with readings, results and supersession marks. */
  @Get(':id')
  @Roles('engineer', 'inspector')
  detail(@Param() { id }: PartIdDto): Promise<PartDetail> {
    return this.parts.detail(id);
  }

  /** Rework (with target, stock and pass plan), scrap, or use as is; append-only. */
  @Post(':id/dispositions')
  dispose(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: PartIdDto,
    @Body() body: DispositionDto,
  ): Promise<Disposition> {
    return this.parts.dispose(actor, id, body);
  }

  @Post(':id/release')
  release(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: PartIdDto,
    @Body() body: ReleaseDto,
  ): Promise<Disposition> {
    return this.parts.release(actor, id, body);
  }
}
