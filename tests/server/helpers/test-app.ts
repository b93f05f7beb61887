import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp, type AppOptions } from '../../../server/app';
import { loadConfig, type ServerConfig } from '../../../server/config/env';

/**
 * Server config for tests: cheap bcrypt, generous sign-in limit unless a test lowers it,
 * and cookies without Secure (supertest speaks plain http) unless a test asks for `auto`.
 */
export function testConfig(url: string, env: Record<string, string> = {}): ServerConfig {
  return loadConfig({
    NODE_ENV: 'test',
    DATABASE_URL: url,
    SESSION_SECRET: 'test-session-secret-0123456789',
    BCRYPT_COST: '4',
    SIGN_IN_MAX_ATTEMPTS: '1000',
    COOKIE_SECURE: 'false',
    // Tests that read the log pass their own logger (tests/server/logging.test.ts).
    LOG_LEVEL: 'silent',
    ...env,
  });
}

/** The real app on a test DataSource; nothing listens. */
export function testApp(
  dataSource: DataSource,
  url: string,
  options: { env?: Record<string, string> } & Partial<Omit<AppOptions, 'dataSource' | 'config'>> = {},
): Express {
  const { env, ...rest } = options;
  return createApp({ dataSource, config: testConfig(url, env), ...rest });
}

/** A supertest agent signed in as `email` (keeps the session cookie). */
export async function signedIn(
  app: Express,
  email: string,
  password: string,
): Promise<ReturnType<typeof request.agent>> {
  // Like the client, every request declares JSON (writes without it are refused).
  const agent = request.agent(app).set('Content-Type', 'application/json');
  const res = await agent.post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200)
    throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}
