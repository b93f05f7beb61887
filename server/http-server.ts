import http from 'node:http';
import type { RequestListener } from 'node:http';
import type { HttpTimeouts } from './config/env';

/**
 * The Node http server for `app`, with time-outs against slow clients: a connection whose
 * headers (or whole request) have not arrived in time gets 408 and is closed, and an idle
 * keep-alive connection is closed after `keepAliveTimeoutMs`. Node checks the first two only
 * every `connectionsCheckingInterval` (30 s by default), so the check runs at least once a
 * second here, more often for short test time-outs.
 */
export function createHttpServer(app: RequestListener, timeouts: HttpTimeouts): http.Server {
  return http.createServer(
    {
      headersTimeout: timeouts.headersTimeoutMs,
      requestTimeout: timeouts.requestTimeoutMs,
      keepAliveTimeout: timeouts.keepAliveTimeoutMs,
      connectionsCheckingInterval: Math.max(25, Math.min(1_000, Math.floor(timeouts.headersTimeoutMs / 4))),
    },
    app,
  );
}
