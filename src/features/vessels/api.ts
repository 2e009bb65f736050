import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import type { VesselSummary } from './types';

export const vesselKeys = {
  all: ['vessels'] as const,
  list: () => [...vesselKeys.all, 'list'] as const,
};

export const vesselQueries = {
  list: () =>
    queryOptions({
      queryKey: vesselKeys.list(),
      queryFn: ({ signal }) => api.get<{ vessels: VesselSummary[] }>('/api/vessels', signal),
      select: (data) => data.vessels,
    }),
};

/** Vessels the signed-in user may see: a skipper's own, or all of the workshop's for staff. */
export const useVessels = () => useQuery(vesselQueries.list());
