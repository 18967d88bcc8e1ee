import { Controller, Get, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Health } from '@evenset/contracts';
import type { Response } from 'express';
import { Public } from '../common/auth/access.decorators';
import { HealthService } from './health.service';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  /** 200 when the app and its database are up; 503 with the same body when the database is down. */
  @Public()
  @Get()
  async check(@Res({ passthrough: true }) res: Response): Promise<Health> {
    const health = await this.health.check();
    if (health.status !== 'ok') res.status(503);
    return health;
  }
}
