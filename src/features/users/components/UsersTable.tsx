import { useState } from 'react';
import type { Role } from '../../../../shared/schemas/role.schema';
import type { User } from '../../../../shared/schemas/user.schema';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { StatusBadge } from '../../../components/ui/StatusBadge';
import { Table, type SortOrder } from '../../../components/ui/Table';
import { formatDateTime } from '../../../lib/format-date';
import { useUpdateUser } from '../api/update-user';
import { TextField } from '../../../components/ui/Field';
import { ResetPasswordDialog } from './ResetPasswordDialog';
import { CURRENT_PASSWORD_HINT, CURRENT_PASSWORD_LABEL, currentPasswordError } from './reauthentication';
import { ROLES } from '../../../../shared/schemas/role.schema';
import { roleLabels } from '../../auth/permissions';

const roleOptions = ROLES.map((r) => ({ value: r, label: roleLabels[r] }));

interface UsersTableProps {
  users: User[];
  currentUserId: string;
  sort: { field: string; order: SortOrder };
  onSort: (field: string) => void;
  busy?: boolean;
}

/** The shop's people with inline role change, deactivate/reactivate and password reset. */
export function UsersTable({ users, currentUserId, sort, onSort, busy }: UsersTableProps) {
  const update = useUpdateUser();
  const pendingId = update.isPending ? update.variables?.id : undefined;
  // Role changes and (re)activation change what someone can do at once: confirm them first,
  // with the admin's own password (the server refuses any account change without it).
  const [pending, setPending] = useState<{ user: User; role?: Role; active?: boolean } | null>(null);
  const [currentPassword, setCurrentPassword] = useState('');
  const [emptyPassword, setEmptyPassword] = useState(false);
  const ask = (next: { user: User; role?: Role; active?: boolean }) => {
    update.reset();
    setCurrentPassword('');
    setEmptyPassword(false);
    setPending(next);
  };
  const confirm = () => {
    if (!pending) return;
    if (!currentPassword) {
      setEmptyPassword(true);
      return;
    }
    const { user, role, active } = pending;
    update.mutate(
      {
        id: user.id,
        body: { ...(role ? { role } : {}), ...(active !== undefined ? { active } : {}), version: user.version, currentPassword },
      },
      { onSuccess: () => setPending(null) },
    );
  };
  const wrongPassword = currentPasswordError(update.error);
  return (
    <>
      <Table
        caption="Users of this shop"
        rows={users}
        rowKey={(u) => u.id}
        sort={sort}
        onSort={onSort}
        busy={busy}
        columns={[
          {
            key: 'displayName',
            header: 'Name',
            sortable: true,
            cell: (u) => (
              <span className="font-medium">
                {u.displayName}
                {u.id === currentUserId ? <span className="ml-2 text-xs text-steel-500">(you)</span> : null}
              </span>
            ),
          },
          { key: 'email', header: 'E-mail', sortable: true, cell: (u) => <span className="font-mono text-xs">{u.email}</span> },
          {
            key: 'role',
            header: 'Role',
            sortable: true,
            cell: (u) => (
              <select
                aria-label={`Role of ${u.displayName}`}
                value={u.role}
                disabled={u.id === currentUserId || pendingId === u.id}
                title={u.id === currentUserId ? 'You cannot change your own role' : undefined}
                onChange={(e) => ask({ user: u, role: e.target.value as Role })}
                className="min-h-11 rounded-md border border-steel-300 bg-white px-2 text-sm disabled:bg-steel-100"
              >
                {roleOptions.map((o) => (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ))}
              </select>
            ),
          },
          {
            key: 'active',
            header: 'Access',
            cell: (u) => (u.active ? <StatusBadge tone="done" label="Active" /> : <StatusBadge tone="muted" label="Deactivated" />),
          },
          { key: 'lastSignInAt', header: 'Last sign-in', sortable: true, cell: (u) => formatDateTime(u.lastSignInAt), className: 'hidden lg:table-cell' },
          {
            key: 'actions',
            header: 'Actions',
            cell: (u) => (
              <div className="flex flex-wrap gap-1">
                <ResetPasswordDialog user={u} />
                {u.id !== currentUserId ? (
                  <Button
                    variant="ghost"
                    busy={pendingId === u.id}
                    onClick={() => ask({ user: u, active: !u.active })}
                  >
                    {u.active ? 'Deactivate' : 'Reactivate'}
                  </Button>
                ) : null}
              </div>
            ),
          },
        ]}
      />
      <ConfirmDialog
        open={pending !== null}
        title={
          pending?.role
            ? `Make ${pending.user.displayName} ${roleLabels[pending.role].toLowerCase()}?`
            : pending?.active
              ? `Reactivate ${pending.user.displayName}?`
              : `Deactivate ${pending?.user.displayName ?? ''}?`
        }
        confirmLabel={pending?.role ? 'Change role' : pending?.active ? 'Reactivate' : 'Deactivate'}
        tone={pending?.role || pending?.active ? 'primary' : 'danger'}
        busy={update.isPending}
        error={pending && !wrongPassword ? update.error : null}
        onCancel={() => {
          setPending(null);
          update.reset();
        }}
        onConfirm={confirm}
      >
        <p>
          {pending?.role
            ? 'What they can see and do changes from their next request.'
            : pending?.active
              ? 'They can sign in again with their last password.'
              : 'They can no longer sign in. Their name stays on every record they made; you can reactivate them later.'}
        </p>
        <div className="mt-3">
          <TextField
            label={CURRENT_PASSWORD_LABEL}
            type="password"
            autoComplete="current-password"
            hint={CURRENT_PASSWORD_HINT}
            value={currentPassword}
            onChange={(e) => {
              setCurrentPassword(e.target.value);
              setEmptyPassword(false);
            }}
            error={emptyPassword ? 'Enter your password' : (wrongPassword ?? undefined)}
          />
        </div>
      </ConfirmDialog>
      {update.error && !pending ? (
        <p role="alert" className="mt-2 rounded-md bg-danger-50 px-3 py-2 text-sm text-danger-700">
          {update.error.message}
        </p>
      ) : null}
    </>
  );
}
