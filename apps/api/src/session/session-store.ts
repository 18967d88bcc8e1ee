import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { Pool } from 'pg';

/** At most one write of a session's new expiry per session and API process in this long. */
export const TOUCH_INTERVAL_MS = 60_000;

const PgStore = connectPgSimple(session);

/**
 * Sessions in PostgreSQL (connect-pg-simple), with rolling expiry written at most once a minute
 * per session: every signed-in request would otherwise update the session row, one more round trip
 * and commit per request (a bench save's most frequent companion). The stored expiry then lags
 * the cookie's by under a minute of a 12-hour lifetime.
 */
export class SessionStore extends PgStore {
  private readonly touchedAt = new Map<string, number>();

  constructor(pool: Pool) {
    super({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 });
  }

  override touch(sid: string, sess: session.SessionData, done?: (error?: unknown) => void): void {
    const now = Date.now();
    const last = this.touchedAt.get(sid);
    if (last !== undefined && now - last < TOUCH_INTERVAL_MS) {
      done?.();
      return;
    }
    this.forgetOlderThan(now - TOUCH_INTERVAL_MS);
    this.touchedAt.delete(sid); // so that the map stays in order of touch
    this.touchedAt.set(sid, now);
    super.touch(sid, sess, done);
  }

  override destroy(sid: string, done?: (error?: unknown) => void): void {
    this.touchedAt.delete(sid);
    super.destroy(sid, done);
  }

  /** Keeps the map to the sessions touched within the interval (a map iterates in insertion order). */
  private forgetOlderThan(time: number): void {
    for (const [sid, at] of this.touchedAt) {
      if (at >= time) return;
      this.touchedAt.delete(sid);
    }
  }
}
