/** Query-string parameters every list endpoint takes, with the resource's sortable fields. */
export interface ListParams<SortField extends string> {
  page?: number;
  pageSize?: number;
  sort?: SortField;
  order?: 'asc' | 'desc';
  q?: string;
}
