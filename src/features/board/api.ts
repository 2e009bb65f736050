import { keepPreviousData, queryOptions, useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { BoardQuery } from '../../../shared/review/review.schema';
import type { BoardView } from '../../../shared/review/views';
import { api } from '../../lib/api-client';

export const boardKeys = {
  all: ['board'] as const,
  list: (query: BoardQuery) => [...boardKeys.all, 'list', query] as const,
};

export const boardQueries = {
  list: (query: BoardQuery) =>
    queryOptions({
      queryKey: boardKeys.list(query),
      queryFn: ({ signal }) => {
        const params = new URLSearchParams({
          show: query.show,
          q: query.q,
          limit: String(query.limit),
        });
        return api.get<BoardView>(`/api/board?${params}`, signal);
      },
      // A new choice or search keeps the rows on screen until the answer comes.
      placeholderData: keepPreviousData,
    }),
};

/** The workshop's runs for a choice and a search, what needs action first (staff only). */
export const useBoard = (query: BoardQuery) => useQuery(boardQueries.list(query));

/** For pages that change a run (a sign-off): the board shows the change on the way back. */
export function useInvalidateBoard() {
  const queryClient = useQueryClient();
  return useCallback(
    () => queryClient.invalidateQueries({ queryKey: boardKeys.all }),
    [queryClient],
  );
}
