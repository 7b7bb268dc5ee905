import { useDebouncedValue } from '@mantine/hooks';
import { useEffect, useState } from 'react';
import { useSearchParams } from 'react-router-dom';

// A list paged, sorted and searched by the API, whose filters live in the address (so a link or a
// reload shows the same page): ?q= (typed text, debounced), ?sort=, ?page=, ?size=, and whatever
// else the screen keeps there.

export function useAddressList(options: {
  defaultSort: string;
  pageSizes: readonly number[];
  defaultPageSize?: number;
}) {
  const [params, setParams] = useSearchParams();
  const sizeAsked = Number(params.get('size'));
  const pageSize = options.pageSizes.includes(sizeAsked) ? sizeAsked : (options.defaultPageSize ?? 25);
  const [query, setQuery] = useState(params.get('q') ?? '');
  const [debounced] = useDebouncedValue(query, 300);

  /** Sets or (with null or '') removes address parameters, replacing the history entry. */
  const update = (changes: Record<string, string | null>) =>
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        for (const [key, value] of Object.entries(changes)) {
          if (value === null || value === '') {
            next.delete(key);
          } else {
            next.set(key, value);
          }
        }
        return next;
      },
      { replace: true },
    );

  useEffect(() => {
    if ((params.get('q') ?? '') !== debounced.trim()) {
      update({ q: debounced.trim(), page: null });
    }
    // Only the typed text drives this.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [debounced]);

  return {
    params,
    update,
    /** the text in the search box, as typed */
    query,
    setQuery,
    /** the search the API is asked for */
    q: params.get('q') ?? '',
    sort: params.get('sort') ?? options.defaultSort,
    page: Math.max(1, Number(params.get('page') ?? '1') || 1),
    pageSize,
  };
}
