import { Body, Controller, Get, HttpCode, Param, Post, Put, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Page, SessionUser, SpecComparison, Spec as SpecView } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { CreateSpecDto, SpecIdDto, SpecListQueryDto, SpecPairDto, UpdateSpecDto } from './specs.dto';
import { SpecsService } from './specs.service';

@ApiTags('specs')
@Controller('specs')
@Roles('engineer')
export class SpecsController {
  constructor(private readonly specs: SpecsService) {}

  @Get()
  @Roles('engineer', 'inspector')
  list(@Query() query: SpecListQueryDto): Promise<Page<SpecView>> {
    return this.specs.list(query);
  }

  @Get(':id')
  @Roles('engineer', 'inspector')
  view(@Param() { id }: SpecIdDto): Promise<SpecView> {
    return this.specs.view(id);
  }

  /** What changed from revision `:id` to revision `:otherId`, field by field. */
  @Get(':id/compare/:otherId')
  @Roles('engineer', 'inspector')
  compare(@Param() { id, otherId }: SpecPairDto): Promise<SpecComparison> {
    return this.specs.compare(id, otherId);
  }

  @Post()
  create(@CurrentUser() actor: SessionUser, @Body() body: CreateSpecDto): Promise<SpecView> {
    return this.specs.create(actor, body);
  }

  @Put(':id')
  update(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: SpecIdDto,
    @Body() body: UpdateSpecDto,
  ): Promise<SpecView> {
    return this.specs.update(actor, id, body.definition);
  }

  @Post(':id/release')
  @HttpCode(200)
  release(@CurrentUser() actor: SessionUser, @Param() { id }: SpecIdDto): Promise<SpecView> {
    return this.specs.release(actor, id);
  }

  /** Starts the next revision (a draft copying this one). */
  @Post(':id/revisions')
  newRevision(@CurrentUser() actor: SessionUser, @Param() { id }: SpecIdDto): Promise<SpecView> {
    return this.specs.newRevision(actor, id);
  }
}
