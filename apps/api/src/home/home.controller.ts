import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Home, SessionUser } from '@evenset/contracts';
import { ANY_ROLE, Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { HomeService } from './home.service';

@ApiTags('home')
@Controller('home')
export class HomeController {
  constructor(private readonly home: HomeService) {}

  /** The work waiting for each of the signed-in person's roles. */
  @Roles(...ANY_ROLE)
  @Get()
  get(@CurrentUser() user: SessionUser): Promise<Home> {
    return this.home.home(user);
  }
}
