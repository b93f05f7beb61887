import { EntitySchema } from 'typeorm';

/** Failed sign-ins counted under one key: `account:<e-mail>` or `address:<client address>`. */
export interface SignInFailure {
  key: string;
  /** Failures since `firstFailureAt`, within the window. */
  failures: number;
  firstFailureAt: Date;
  lastFailureAt: Date;
  /** While in the future, attempts under this key are slowed down (429 with Retry-After). */
  blockedUntil: Date | null;
}

export const SignInFailureEntity = new EntitySchema<SignInFailure>({
  name: 'SignInFailure',
  tableName: 'sign_in_failure',
  columns: {
    key: { type: 'text', primary: true },
    failures: { type: 'integer' },
    firstFailureAt: { name: 'first_failure_at', type: 'timestamptz' },
    lastFailureAt: { name: 'last_failure_at', type: 'timestamptz' },
    blockedUntil: { name: 'blocked_until', type: 'timestamptz', nullable: true },
  },
});
