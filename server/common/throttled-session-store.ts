import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';

const PgStore = connectPgSimple(session);
type PgStoreOptions = ConstructorParameters<typeof PgStore>[0];
type TouchCallback = Parameters<InstanceType<typeof PgStore>['touch']>[2];

/** Most sessions one process remembers touching; beyond it the memory starts afresh. */
const MAX_REMEMBERED = 50_000;

/**
 * The PostgreSQL session store, writing a session's new idle expiry at most once per
 * `touchEverySeconds`. A rolling session is touched on every request, which cost one
 * UPDATE per read (the spool list did 8× fewer requests per second than a bare route);
 * the idle time-out is hours, so moving it on by the minute loses nothing.
 */
export class ThrottledPgStore extends PgStore {
  private readonly touched = new Map<string, number>();

  constructor(
    options: PgStoreOptions,
    private readonly touchEveryMs = 60_000,
  ) {
    super(options);
  }

  override touch(sid: string, sess: session.SessionData, callback?: TouchCallback): void {
    const now = Date.now();
    const last = this.touched.get(sid);
    if (last !== undefined && now - last < this.touchEveryMs) {
      callback?.();
      return;
    }
    if (this.touched.size >= MAX_REMEMBERED) this.touched.clear();
    this.touched.set(sid, now);
    super.touch(sid, sess, callback);
  }

  override destroy(sid: string, callback?: (err?: unknown) => void): void {
    this.touched.delete(sid);
    super.destroy(sid, callback);
  }
}
