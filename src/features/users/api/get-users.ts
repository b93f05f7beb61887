import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '../../../../shared/schemas/list-query.schema';
import type { Role } from '../../../../shared/schemas/role.schema';
import type { User, USER_SORT_FIELDS } from '../../../../shared/schemas/user.schema';
import { apiRequest } from '../../../lib/api-client';
import type { ListParams } from '../../../lib/list-params';
import { userKeys } from './user-keys';

/** Query-string parameters of the user list. */
export interface UserListParams extends ListParams<(typeof USER_SORT_FIELDS)[number]> {
  role?: Role;
  active?: boolean;
}

/** One page of the shop's users (admins only). */
export function getUsers(params: UserListParams, signal?: AbortSignal): Promise<Page<User>> {
  return apiRequest<Page<User>>('/users', { query: params, signal });
}

export const usersQueryOptions = (params: UserListParams) =>
  queryOptions({
    queryKey: userKeys.list(params),
    queryFn: ({ signal }) => getUsers(params, signal),
    placeholderData: keepPreviousData,
  });

/** The user list. */
export function useUsers(params: UserListParams) {
  return useQuery(usersQueryOptions(params));
}
