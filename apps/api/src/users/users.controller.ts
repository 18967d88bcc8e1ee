import { Body, Controller, Get, HttpCode, Param, Post, Put, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Page, SessionUser, User as UserView } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { ChangeRolesDto, CreateUserDto, ResetPasswordDto, UserIdDto, UserListQueryDto } from './users.dto';
import { UsersService } from './users.service';

@ApiTags('people')
@Controller('users')
@Roles('admin')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  list(@Query() query: UserListQueryDto): Promise<Page<UserView>> {
    return this.users.list(query);
  }

  @Post()
  create(@CurrentUser() actor: SessionUser, @Body() body: CreateUserDto): Promise<UserView> {
    return this.users.create(actor, body);
  }

  @Put(':id/roles')
  changeRoles(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: UserIdDto,
    @Body() body: ChangeRolesDto,
  ): Promise<UserView> {
    return this.users.changeRoles(actor, id, body);
  }

  @Post(':id/deactivate')
  @HttpCode(200)
  deactivate(@CurrentUser() actor: SessionUser, @Param() { id }: UserIdDto): Promise<UserView> {
    return this.users.setActive(actor, id, false);
  }

  @Post(':id/reactivate')
  @HttpCode(200)
  reactivate(@CurrentUser() actor: SessionUser, @Param() { id }: UserIdDto): Promise<UserView> {
    return this.users.setActive(actor, id, true);
  }

  @Post(':id/password')
  @HttpCode(204)
  async resetPassword(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: UserIdDto,
    @Body() body: ResetPasswordDto,
  ): Promise<void> {
    await this.users.resetPassword(actor, id, body.password);
  }
}
