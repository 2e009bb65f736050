import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from '@tanstack/react-query';
import type { VesselInput, ListStatus } from '../../../shared/vessels/vessel.schema';
import type { SkipperOption, VesselView } from '../../../shared/vessels/vessel-view';
import { api, isApiError } from '../../lib/api-client';
import { db } from '../../lib/db';

export type VesselFilters = { q: string; status: ListStatus };
export type EngineFilters = { q: string; status: ListStatus; vesselId?: string };

const search = (filters: Record<string, string | undefined>) => {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value) params.set(key, value);
  const text = params.toString();
  return text ? `?${text}` : '';
};

/** One key factory for vessels and engines: a change to either shows up in both lists. */
export const vesselKeys = {
  all: ['vessels'] as const,
  list: () => [...vesselKeys.all, 'list'] as const,
  filtered: (filters: VesselFilters) => [...vesselKeys.list(), filters] as const,
  detail: (id: string) => [...vesselKeys.all, 'detail', id] as const,
  skippers: () => [...vesselKeys.all, 'skippers'] as const,
  save: () => [...vesselKeys.all, 'save'] as const,
  archive: () => [...vesselKeys.all, 'archive'] as const,
  link: () => [...vesselKeys.all, 'link-skipper'] as const,
};

export const engineKeys = {
  all: ['engines'] as const,
  list: (filters: EngineFilters) => [...engineKeys.all, 'list', filters] as const,
  detail: (id: string) => [...engineKeys.all, 'detail', id] as const,
  save: () => [...engineKeys.all, 'save'] as const,
  archive: () => [...engineKeys.all, 'archive'] as const,
};

/**
 * The user's vessels; with no network, the copy sync keeps on this device, so a skipper opening
 * the app offshore still sees their boats.
 */
export async function fetchVesselList(signal?: AbortSignal): Promise<{ vessels: VesselView[] }> {
  try {
    return await api.get<{ vessels: VesselView[] }>('/api/vessels', signal);
  } catch (error) {
    if (!isApiError(error) || !error.isNetworkError) throw error;
    const onDevice = (await db.vessels.toArray()).sort((a, b) => a.name.localeCompare(b.name));
    if (onDevice.length === 0) throw error;
    return { vessels: onDevice };
  }
}

/**
 * Vessel lists change under other people's hands (a colleague's new vessel): kept fresh only
 * briefly, so the route's prefetch and the page share one request.
 */
const FRESH_MS = 5_000;

export const vesselQueries = {
  list: () =>
    queryOptions({
      queryKey: vesselKeys.list(),
      queryFn: ({ signal }) => fetchVesselList(signal),
      select: (data) => data.vessels,
      // A colleague's new vessel must be there when the invite form or the list opens.
      staleTime: FRESH_MS,
    }),
  filtered: (filters: VesselFilters) =>
    queryOptions({
      queryKey: vesselKeys.filtered(filters),
      queryFn: ({ signal }) =>
        api.get<{ vessels: VesselView[] }>(`/api/vessels${search(filters)}`, signal),
      select: (data) => data.vessels,
      staleTime: FRESH_MS,
      // The list stays on screen (and keeps its sorting) while a new search loads.
      placeholderData: keepPreviousData,
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: vesselKeys.detail(id),
      queryFn: ({ signal }) => api.get<{ vessel: VesselView }>(`/api/vessels/${id}`, signal),
      select: (data) => data.vessel,
      // Skippers submit and colleagues add engines meanwhile: read afresh on every visit.
      staleTime: 0,
    }),
  skippers: () =>
    queryOptions({
      queryKey: vesselKeys.skippers(),
      queryFn: ({ signal }) => api.get<{ skippers: SkipperOption[] }>('/api/skippers', signal),
      select: (data) => data.skippers,
    }),
};

/** Vessels the signed-in user may see: a skipper's own, or all of the workshop's for staff. */
export const useVessels = () => useQuery(vesselQueries.list());
export const useVesselList = (filters: VesselFilters) => useQuery(vesselQueries.filtered(filters));
export const useVessel = (id: string) => useQuery(vesselQueries.detail(id));
export const useSkippers = () => useQuery(vesselQueries.skippers());

/** After any change to a vessel or an engine, every list and page showing them is refetched. */
export function useInvalidateFleet() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: vesselKeys.all }),
      queryClient.invalidateQueries({ queryKey: engineKeys.all }),
    ]);
}

export function useSaveVessel() {
  const invalidate = useInvalidateFleet();
  return useMutation({
    mutationKey: vesselKeys.save(),
    mutationFn: ({ id, input }: { id?: string; input: VesselInput }) =>
      id
        ? api.put<{ vessel: VesselView }>(`/api/vessels/${id}`, input)
        : api.post<{ vessel: VesselView }>('/api/vessels', input),
    onSuccess: () => invalidate(),
  });
}

export function useArchiveVessel() {
  const invalidate = useInvalidateFleet();
  return useMutation({
    mutationKey: vesselKeys.archive(),
    mutationFn: ({ id, archived }: { id: string; archived: boolean }) =>
      api.post<{ vessel: VesselView }>(`/api/vessels/${id}/${archived ? 'archive' : 'restore'}`),
    onSuccess: () => invalidate(),
  });
}

export function useSkipperLink() {
  const invalidate = useInvalidateFleet();
  return useMutation({
    mutationKey: vesselKeys.link(),
    mutationFn: ({
      vesselId,
      userId,
      linked,
    }: {
      vesselId: string;
      userId: string;
      linked: boolean;
    }) =>
      linked
        ? api.put<{ vessel: VesselView }>(`/api/vessels/${vesselId}/skippers/${userId}`)
        : api.delete<{ vessel: VesselView }>(`/api/vessels/${vesselId}/skippers/${userId}`),
    onSuccess: () => invalidate(),
  });
}
