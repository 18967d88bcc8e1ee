import { Body, Controller, Get, Param, Post, Put, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Material as MaterialView, Page, SessionUser } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { MaterialIdDto, MaterialInputDto, MaterialListQueryDto } from './materials.dto';
import { MaterialsService } from './materials.service';

@ApiTags('materials')
@Controller('materials')
@Roles('engineer')
export class MaterialsController {
  constructor(private readonly materials: MaterialsService) {}

  @Get()
  @Roles('engineer', 'inspector')
  list(@Query() query: MaterialListQueryDto): Promise<Page<MaterialView>> {
    return this.materials.list(query);
  }

  @Post()
  create(@CurrentUser() actor: SessionUser, @Body() body: MaterialInputDto): Promise<MaterialView> {
    return this.materials.create(actor, body);
  }

  @Put(':id')
  update(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: MaterialIdDto,
    @Body() body: MaterialInputDto,
  ): Promise<MaterialView> {
    return this.materials.update(actor, id, body);
  }
}
