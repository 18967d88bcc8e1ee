import { Body, Controller, HttpCode, Post, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { PASSWORD_RESET_REQUESTED_MESSAGE } from '@evenset/contracts';
import { Public } from '../common/auth/access.decorators';
import { LoginThrottlerGuard } from './login-throttler.guard';
import { PasswordResetConfirmDto, PasswordResetRequestDto } from './password-reset.dto';
import { PasswordResetService } from './password-reset.service';

@ApiTags('sign-in')
@Controller('auth/password-reset')
export class PasswordResetController {
  constructor(private readonly resets: PasswordResetService) {}

  /** The same answer whether or not the address has an account. */
  @Public()
  @Post()
  @HttpCode(202)
  @UseGuards(LoginThrottlerGuard)
  async request(@Body() { email }: PasswordResetRequestDto): Promise<{ message: string }> {
    await this.resets.request(email);
    return { message: PASSWORD_RESET_REQUESTED_MESSAGE };
  }

  @Public()
  @Post('confirm')
  @HttpCode(204)
  @UseGuards(LoginThrottlerGuard)
  async confirm(@Body() input: PasswordResetConfirmDto): Promise<void> {
    await this.resets.confirm(input);
  }
}
