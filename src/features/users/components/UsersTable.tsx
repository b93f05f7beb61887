import { useState } from 'react';
import type { Role } from '../../../../shared/schemas/role.schema';
import type { User } from '../../../../shared/schemas/user.schema';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { StatusBadge } from '../../../components/ui/StatusBadge';
import { Table, type SortOrder } from '../../../components/ui/Table';
import { formatDateTime } from '../../../lib/format-date';
import { useUpdateUser } from '../api/update-user';
import { ResetPasswordDialog } from './ResetPasswordDialog';
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
  // Role changes and deactivation change what someone can do at once: confirm them first.
  const [pending, setPending] = useState<{ user: User; role?: Role; active?: boolean } | null>(null);
  const confirm = () => {
    if (!pending) return;
    const { user, role, active } = pending;
    update.mutate(
      { id: user.id, body: { ...(role ? { role } : {}), ...(active !== undefined ? { active } : {}), version: user.version } },
      { onSuccess: () => setPending(null) },
    );
  };
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
                onChange={(e) => setPending({ user: u, role: e.target.value as Role })}
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
                    onClick={() => (u.active ? setPending({ user: u, active: false }) : update.mutate({ id: u.id, body: { active: true, version: u.version } }))}
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
            : `Deactivate ${pending?.user.displayName ?? ''}?`
        }
        confirmLabel={pending?.role ? 'Change role' : 'Deactivate'}
        tone={pending?.role ? 'primary' : 'danger'}
        busy={update.isPending}
        error={pending ? update.error : null}
        onCancel={() => {
          setPending(null);
          update.reset();
        }}
        onConfirm={confirm}
      >
        {pending?.role
          ? 'What they can see and do changes from their next request.'
          : 'They can no longer sign in. Their name stays on every record they made; you can reactivate them later.'}
      </ConfirmDialog>
      {update.error && !pending ? (
        <p role="alert" className="mt-2 rounded-md bg-danger-50 px-3 py-2 text-sm text-danger-700">
          {update.error.message}
        </p>
      ) : null}
    </>
  );
}
