import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { Health } from '@evenset/contracts';

const DATABASE_PROBE_TIMEOUT_MS = 2000;

@Injectable()
export class HealthService {
  private readonly started = Date.now();

  constructor(private readonly em: EntityManager) {}

  async check(): Promise<Health> {
    const database = await this.probeDatabase();
    return {
      status: database.status === 'up' ? 'ok' : 'degraded',
      app: {
        name: 'evenset',
        version: process.env.npm_package_version ?? '0.1.0',
        uptimeSeconds: Math.round((Date.now() - this.started) / 1000),
      },
      database,
    };
  }

  private async probeDatabase(): Promise<Health['database']> {
    const start = performance.now();
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error('database probe timed out')), DATABASE_PROBE_TIMEOUT_MS);
    });
    try {
      await Promise.race([this.em.getConnection().execute('select 1'), timeout]);
      return {
        status: 'up',
        latencyMs: Math.round((performance.now() - start) * 10) / 10,
      };
    } catch {
      return { status: 'down' };
    } finally {
      clearTimeout(timer);
    }
  }
}
