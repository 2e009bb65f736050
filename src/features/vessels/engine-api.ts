import { keepPreviousData, queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { EngineInput } from '../../../shared/engines/engine.schema';
import type { EngineRow } from '../../../shared/vessels/vessel-view';
import { api } from '../../lib/api-client';
import { engineKeys, useInvalidateFleet, type EngineFilters } from './api';

const search = (filters: EngineFilters) => {
  const params = new URLSearchParams();
  if (filters.q) params.set('q', filters.q);
  params.set('status', filters.status);
  if (filters.vesselId) params.set('vesselId', filters.vesselId);
  return `?${params.toString()}`;
};

export const engineQueries = {
  list: (filters: EngineFilters) =>
    queryOptions({
      queryKey: engineKeys.list(filters),
      queryFn: ({ signal }) =>
        api.get<{ engines: EngineRow[] }>(`/api/engines${search(filters)}`, signal),
      select: (data) => data.engines,
      // The list stays on screen (and keeps its sorting) while a new search loads.
      placeholderData: keepPreviousData,
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: engineKeys.detail(id),
      queryFn: ({ signal }) => api.get<{ engine: EngineRow }>(`/api/engines/${id}`, signal),
      select: (data) => data.engine,
    }),
};

export const useEngineList = (filters: EngineFilters) => useQuery(engineQueries.list(filters));
export const useEngine = (id: string) => useQuery(engineQueries.detail(id));

export function useSaveEngine() {
  const invalidate = useInvalidateFleet();
  return useMutation({
    mutationKey: engineKeys.save(),
    mutationFn: ({ id, input }: { id?: string; input: EngineInput }) =>
      id
        ? api.put<{ engine: EngineRow }>(`/api/engines/${id}`, input)
        : api.post<{ engine: EngineRow }>('/api/engines', input),
    onSuccess: () => invalidate(),
  });
}

export function useArchiveEngine() {
  const invalidate = useInvalidateFleet();
  return useMutation({
    mutationKey: engineKeys.archive(),
    mutationFn: ({ id, archived }: { id: string; archived: boolean }) =>
      api.post<{ engine: EngineRow }>(`/api/engines/${id}/${archived ? 'archive' : 'restore'}`),
    onSuccess: () => invalidate(),
  });
}
