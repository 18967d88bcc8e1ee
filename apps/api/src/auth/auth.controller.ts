import { Body, Controller, Get, HttpCode, Post, Req, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Session } from '@evenset/contracts';
import type { Request } from 'express';
import { ANY_ROLE, Public, Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { csrf } from '../common/auth/csrf';
import { AuthService } from './auth.service';
import { LoginDto } from './auth.dto';
import { LoginGuard } from './login.guard';
import { LoginThrottlerGuard } from './login-throttler.guard';
import type { SessionUser } from '@evenset/contracts';

@ApiTags('sign-in')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  /** A CSRF token for this browser's session; the sign-in form needs one before it posts. */
  @Public()
  @Get('csrf')
  token(@Req() req: Request): { csrfToken: string } {
    return { csrfToken: csrf.generateToken(req) };
  }

  @Public()
  @Post('login')
  @HttpCode(200)
  @UseGuards(LoginThrottlerGuard, LoginGuard)
  login(@Req() req: Request, @CurrentUser() user: SessionUser, @Body() _credentials: LoginDto): Session {
    // The session was regenerated at sign-in, so the old CSRF token is gone: hand out a new one.
    return { user, csrfToken: csrf.generateToken(req, true) };
  }

  @Roles(...ANY_ROLE)
  @Post('logout')
  @HttpCode(204)
  async logout(@Req() req: Request): Promise<void> {
    await new Promise<void>((resolve, reject) => req.logout((error) => (error ? reject(error) : resolve())));
    await new Promise<void>((resolve, reject) => req.session.destroy((error) => (error ? reject(error) : resolve())));
  }

  @Roles(...ANY_ROLE)
  @Get('me')
  me(@Req() req: Request, @CurrentUser() user: SessionUser): Session {
    return { user, csrfToken: csrf.generateToken(req) };
  }
}
