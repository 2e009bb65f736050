import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AssignProgramInput, CancelRunInput } from '../../../shared/runs/run.schema';
import type { RunView } from '../../../shared/runs/run-view';
import type { EngineRow } from '../../../shared/vessels/vessel-view';
import { api } from '../../lib/api-client';
import { programKeys } from './api';

/*
 * What the engine page's assign card reads and writes: the engine (to judge which programs suit
 * it), the engine's runs (to show a planned one), assigning and cancelling.
 */

export const assignKeys = {
  /** The same key and answer as the vessels feature's engine query: an edit of the engine refreshes both. */
  engine: (engineId: string) => ['engines', 'detail', engineId] as const,
  engineRuns: (engineId: string) => [...programKeys.all, 'engine-runs', engineId] as const,
  cancel: () => [...programKeys.all, 'cancel-run'] as const,
};

export const assignQueries = {
  engine: (engineId: string) =>
    queryOptions({
      queryKey: assignKeys.engine(engineId),
      queryFn: ({ signal }) => api.get<{ engine: EngineRow }>(`/api/engines/${engineId}`, signal),
      select: (data) => data.engine,
    }),
  engineRuns: (engineId: string) =>
    queryOptions({
      queryKey: assignKeys.engineRuns(engineId),
      queryFn: ({ signal }) =>
        api.get<{ runs: RunView[] }>(`/api/runs?engineId=${encodeURIComponent(engineId)}`, signal),
      select: (data) => data.runs,
    }),
};

export const useAssignEngine = (engineId: string) => useQuery(assignQueries.engine(engineId));
export const useEngineRuns = (engineId: string) => useQuery(assignQueries.engineRuns(engineId));

export interface AssignedRun {
  id: string;
}

/** Runs show on several pages (board, engine, deck); a change refreshes whatever is on screen. */
function useRunWrite<TInput>(
  mutationKey: readonly unknown[],
  mutationFn: (input: TInput) => Promise<{ run: AssignedRun }>,
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey,
    mutationFn,
    // Not awaited: the refetch swaps the card that sent this for the new run, and a caller's own
    // onSuccess (the "Run created." note) must run before that card is gone.
    onSuccess: () => {
      void queryClient.invalidateQueries({ refetchType: 'active' });
    },
  });
}

export const useAssignProgram = () =>
  useRunWrite(programKeys.assign(), (input: AssignProgramInput) =>
    api.post<{ run: AssignedRun }>('/api/runs', input),
  );

export const useCancelRun = () =>
  useRunWrite(assignKeys.cancel(), ({ runId, ...input }: CancelRunInput & { runId: string }) =>
    api.post<{ run: AssignedRun }>(`/api/runs/${encodeURIComponent(runId)}/cancel`, input),
  );
