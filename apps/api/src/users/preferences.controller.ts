import { Body, Controller, Patch } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { preferencesSchema, type SessionUser } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { ANY_ROLE, Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { PreferencesService } from './preferences.service';

class PreferencesDto extends createZodDto(preferencesSchema) {}

/** What the signed-in person changes for themselves. */
@ApiTags('people')
@Controller('me')
@Roles(...ANY_ROLE)
export class PreferencesController {
  constructor(private readonly preferences: PreferencesService) {}

  @Patch('preferences')
  update(@CurrentUser() actor: SessionUser, @Body() body: PreferencesDto): Promise<SessionUser> {
    return this.preferences.update(actor, body);
  }
}
