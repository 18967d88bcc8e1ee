import { Injectable, OnApplicationShutdown } from '@nestjs/common';
import { Pool } from 'pg';
import { AppConfig } from '../config/app-config.service';

/** The session store's own small pool, closed once when the app shuts down. */
@Injectable()
export class SessionPool implements OnApplicationShutdown {
  readonly pool: Pool;

  constructor(config: AppConfig) {
    this.pool = new Pool({ connectionString: config.get('DATABASE_URL'), max: 5, connectionTimeoutMillis: 3000 });
    this.pool.on('error', () => undefined); // a dropped idle connection is replaced on next use
  }

  async onApplicationShutdown(): Promise<void> {
    await this.pool.end();
  }
}
