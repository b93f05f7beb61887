import { USER_SORT_FIELDS } from '../../../shared/schemas/user.schema';
import { EmptyState } from '../../components/ui/EmptyState';
import { ErrorState } from '../../components/ui/ErrorState';
import { PageHeader } from '../../components/ui/PageHeader';
import { Pagination } from '../../components/ui/Pagination';
import { SearchBox } from '../../components/ui/SearchBox';
import { LoadingBlock } from '../../components/ui/Spinner';
import { useCurrentUser } from '../../features/auth/hooks/use-current-user';
import { can } from '../../features/auth/permissions';
import { useUsers } from '../../features/users/api/get-users';
import { CreateUserDialog } from '../../features/users/components/CreateUserDialog';
import { UsersTable } from '../../features/users/components/UsersTable';
import { useListSearchParams } from '../../lib/use-list-search-params';

const PAGE_SIZE = 25;
const DEFAULT_SORT = { sort: 'displayName', order: 'asc' } as const;

function UsersPage() {
  const user = useCurrentUser();
  const { state, update, toggleSort } = useListSearchParams(USER_SORT_FIELDS, DEFAULT_SORT);
  const users = useUsers({ page: state.page, pageSize: PAGE_SIZE, sort: state.sort, order: state.order, q: state.q || undefined });
  return (
    <div className="flex flex-col gap-5">
      <PageHeader eyebrow={user.organisation.name} title="Users" actions={<CreateUserDialog />} />
      <SearchBox label="Search users" placeholder="Search name or e-mail" value={state.q} onChange={(q) => update({ q, page: 1 })} />
      {users.isPending ? (
        <LoadingBlock label="Loading users…" />
      ) : users.isError ? (
        <ErrorState error={users.error} onRetry={() => void users.refetch()} />
      ) : users.data.items.length === 0 ? (
        <EmptyState title="No user matches">Nothing matches “{state.q}”.</EmptyState>
      ) : (
        <>
          <UsersTable
            users={users.data.items}
            currentUserId={user.id}
            sort={{ field: state.sort, order: state.order }}
            onSort={toggleSort}
            busy={users.isFetching && users.isPlaceholderData}
          />
          <Pagination page={state.page} pageSize={PAGE_SIZE} total={users.data.total} onPage={(page) => update({ page })} noun="users" />
        </>
      )}
    </div>
  );
}

/** Admins manage the shop's people; other roles are told, not shown a broken page. */
export function Component() {
  const user = useCurrentUser();
  if (!can.manageUsers(user.role)) {
    return (
      <div className="mx-auto max-w-lg py-16">
        <h1 className="text-3xl font-bold">Admins only</h1>
        <p className="mt-2 text-steel-600">Ask your shop's admin to add people or change roles.</p>
      </div>
    );
  }
  return <UsersPage />;
}
