import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import type { User } from '../../../shared/schemas/user.schema';
import { passwordResetSchema, userCreateSchema, userUpdateSchema } from '../../../shared/schemas/user.schema';
import { currentPasswordError } from '../../../src/features/users/components/reauthentication';
import { ResetPasswordForm } from '../../../src/features/users/components/ResetPasswordDialog';
import { UserForm } from '../../../src/features/users/components/UserForm';
import { ApiError, toApiError } from '../../../src/lib/api-error';

const user: User = {
  id: '00000000-0000-4000-8000-000000000001',
  email: 'fitter@example.test',
  displayName: 'Test Fitter',
  role: 'fabricator',
  active: true,
  lastSignInAt: null,
  organisation: { id: '00000000-0000-4000-8000-000000000002', name: 'Test Shop' },
  createdAt: '2026-12-01T10:00:00.000Z',
  updatedAt: '2026-12-01T10:00:00.000Z',
  version: 1,
};

function render(node: ReactNode): string {
  return renderToStaticMarkup(<QueryClientProvider client={new QueryClient()}>{node}</QueryClientProvider>);
}

/** The `<input>` tag that follows the label text `label` in `html`. */
function inputAfter(html: string, label: string): string {
  const at = html.indexOf(`>${label}<`);
  expect(at, `label "${label}"`).toBeGreaterThan(-1);
  return /<input[^>]*>/.exec(html.slice(at))?.[0] ?? '';
}

describe("user dialogs ask for the admin's own password", () => {
  it('the add-user form has a "Your password" field bound to currentPassword', () => {
    const html = render(<UserForm busy={false} error={null} onSubmit={() => {}} onCancel={() => {}} />);
    const input = inputAfter(html, 'Your password');
    expect(input).toContain('name="currentPassword"');
    expect(input).toContain('type="password"');
    expect(input).toContain('autoComplete="current-password"');
  });

  it('the reset-password form has a "Your password" field bound to currentPassword', () => {
    const html = render(<ResetPasswordForm user={user} onDone={() => {}} />);
    expect(inputAfter(html, 'Your password')).toContain('name="currentPassword"');
    expect(inputAfter(html, 'New password')).toContain('name="password"');
  });

  it('a 403 reauthentication_failed answer becomes a message on that field; other refusals do not', () => {
    const refused = toApiError(403, {
      error: { code: 'reauthentication_failed', message: 'Your password is not correct; nothing was changed' },
    });
    expect(currentPasswordError(refused)).toMatch(/not your password.*Nothing was changed/);
    expect(currentPasswordError(new ApiError(403, 'forbidden', 'Your role does not allow this'))).toBeNull();
    expect(currentPasswordError(new Error('offline'))).toBeNull();
    expect(currentPasswordError(null)).toBeNull();
  });

  it('the shared schemas the forms validate with refuse a write without currentPassword', () => {
    const create = { email: 'a@example.test', displayName: 'A', role: 'viewer', password: 'long-password-1' };
    expect(userCreateSchema.safeParse(create).success).toBe(false);
    expect(userCreateSchema.safeParse({ ...create, currentPassword: '' }).success).toBe(false);
    expect(userCreateSchema.safeParse({ ...create, currentPassword: 'mine' }).success).toBe(true);
    expect(userUpdateSchema.safeParse({ role: 'viewer' }).success).toBe(false);
    expect(passwordResetSchema.safeParse({ password: 'long-password-1' }).success).toBe(false);
    expect(passwordResetSchema.safeParse({ password: 'long-password-1', currentPassword: 'x'.repeat(201) }).success).toBe(
      false,
    );
  });
});
