import type { DataTableSortStatus } from 'mantine-datatable';
import { useMemo, useState } from 'react';
import { compareValues } from './format';

// Sorting, filtering and paging on the client, for lists the API sends whole (lots, balances,
// counts, readings). The table gets `records` for the page and the props to wire its controls.

interface ClientTableOptions<T> {
  /** The words a row is found by (the filter box matches every word typed). */
  searchText: (record: T) => string;
  /** The value a column sorts by (default: the property of that name). */
  sortValue?: (record: T, column: string) => unknown;
  /** Decimal strings sort as numbers when the caller says so. */
  compare?: (column: string, a: unknown, b: unknown) => number | undefined;
  initialSort: DataTableSortStatus<T>;
  pageSizes?: number[];
}

export function useClientTable<T>(records: readonly T[], options: ClientTableOptions<T>) {
  const pageSizes = options.pageSizes ?? [25, 50, 100];
  const [query, setQueryState] = useState('');
  const [sortStatus, setSortStatusState] = useState<DataTableSortStatus<T>>(options.initialSort);
  const [page, setPage] = useState(1);
  const [pageSize, setPageSizeState] = useState(pageSizes[0] ?? 25);
  const { searchText, sortValue, compare } = options;

  const sorted = useMemo(() => {
    const words = query.toLowerCase().split(/\s+/).filter(Boolean);
    const column = String(sortStatus.columnAccessor);
    const direction = sortStatus.direction === 'asc' ? 1 : -1;
    const valueOf = (record: T) =>
      sortValue ? sortValue(record, column) : (record as Record<string, unknown>)[column];
    return records
      .filter((record) => {
        if (words.length === 0) {
          return true;
        }
        const haystack = searchText(record).toLowerCase();
        return words.every((word) => haystack.includes(word));
      })
      .sort((a, b) => {
        const x = valueOf(a);
        const y = valueOf(b);
        return direction * (compare?.(column, x, y) ?? compareValues(x, y));
      });
  }, [records, query, sortStatus, searchText, sortValue, compare]);

  const lastPage = Math.max(1, Math.ceil(sorted.length / pageSize));
  const currentPage = Math.min(page, lastPage);

  return {
    query,
    setQuery: (value: string) => {
      setQueryState(value);
      setPage(1);
    },
    total: sorted.length,
    records: sorted.slice((currentPage - 1) * pageSize, currentPage * pageSize),
    tableProps: {
      sortStatus,
      onSortStatusChange: (status: DataTableSortStatus<T>) => {
        setSortStatusState(status);
        setPage(1);
      },
      totalRecords: sorted.length,
      recordsPerPage: pageSize,
      page: currentPage,
      onPageChange: setPage,
      recordsPerPageOptions: pageSizes,
      onRecordsPerPageChange: (size: number) => {
        setPageSizeState(size);
        setPage(1);
      },
      paginationText: ({ from, to, totalRecords }: { from: number; to: number; totalRecords: number }) =>
        `${from}–${to} of ${totalRecords}`,
    },
    resetPage: () => setPage(1),
  };
}
