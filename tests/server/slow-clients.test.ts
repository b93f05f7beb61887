import type { AddressInfo } from 'node:net';
import net from 'node:net';
import type http from 'node:http';
import { afterEach, describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/config/env';
import { createHttpServer } from '../../server/http-server';

let server: http.Server | undefined;
afterEach(async () => {
  server?.closeAllConnections();
  await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
  server = undefined;
});

/** A server with the given time-outs (ms) whose only handler answers once the whole request is in. */
async function listen(env: Record<string, string>): Promise<number> {
  const { http: timeouts } = loadConfig({ NODE_ENV: 'test', ...env });
  server = createHttpServer((req, res) => {
    req.resume();
    req.on('end', () => res.end('ok'));
  }, timeouts);
  await new Promise<void>((resolve) => server!.listen(0, '127.0.0.1', resolve));
  return (server.address() as AddressInfo).port;
}

/**
 * Opens a raw socket, writes `chunk` and never finishes the request. Resolves with what the
 * server sent before closing, or `null` if the socket is still open after `waitMs`
 * (a bound far above the configured time-out, not a speed target).
 */
function stall(port: number, chunk: string, waitMs: number): Promise<string | null> {
  return new Promise((resolve) => {
    const socket = net.connect(port, '127.0.0.1', () => socket.write(chunk));
    let received = '';
    socket.on('data', (d: Buffer) => (received += d.toString()));
    const guard = setTimeout(() => {
      socket.destroy();
      resolve(null);
    }, waitMs);
    socket.on('close', () => {
      clearTimeout(guard);
      resolve(received);
    });
    socket.on('error', () => {});
  });
}

const SHORT = {
  HTTP_HEADERS_TIMEOUT_MS: '300',
  HTTP_REQUEST_TIMEOUT_MS: '600',
  HTTP_KEEP_ALIVE_TIMEOUT_MS: '300',
};

describe('slow clients', () => {
  it('closes a connection whose headers stall (408)', async () => {
    const port = await listen(SHORT);
    const answer = await stall(port, 'GET /api/health HTTP/1.1\r\nHost: 127.0.0.1\r\nX-Slow: 1', 10_000);
    expect(answer).not.toBeNull();
    expect(answer).toMatch(/^HTTP\/1\.1 408/);
  });

  it('closes a connection whose body stalls (408)', async () => {
    const port = await listen(SHORT);
    const head =
      'POST /api/jobs HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: application/json\r\nContent-Length: 1000\r\n\r\n{"a":';
    const answer = await stall(port, head, 10_000);
    expect(answer).not.toBeNull();
    expect(answer).toMatch(/^HTTP\/1\.1 408/);
  });

  it('closes an idle keep-alive connection after a complete request', async () => {
    const port = await listen(SHORT);
    const answer = await stall(port, 'GET / HTTP/1.1\r\nHost: 127.0.0.1\r\n\r\n', 10_000);
    expect(answer).toMatch(/^HTTP\/1\.1 200/);
    expect(answer).toContain('Keep-Alive: timeout=0'); // 300 ms rounds down to 0 s in the hint
  });

  it('defaults to closing stalled requests well before 25 s, and refuses a bad value', () => {
    const { http: d } = loadConfig({ NODE_ENV: 'test' });
    expect(d.headersTimeoutMs).toBeLessThan(25_000);
    expect(d.requestTimeoutMs).toBeLessThan(25_000);
    expect(d.requestTimeoutMs).toBeGreaterThanOrEqual(d.headersTimeoutMs);
    expect(() => loadConfig({ HTTP_HEADERS_TIMEOUT_MS: 'soon' })).toThrow(/HTTP_HEADERS_TIMEOUT_MS/);
  });
});
