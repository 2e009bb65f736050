import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RunReviewView } from '../../../shared/review/views';
import type { RunDetail, RunView } from '../../../shared/runs/run-view';
import { api } from '../../lib/api-client';

/*
 * A run as its skipper (or anyone who may see it) reads it: the run itself (GET /api/runs/:id)
 * and its worked-out figures, decisions, certificate and first service (GET /api/runs/:id/review).
 * The server answers 404 for a run the user may not see.
 */

const runPath = (runId: string) => `/api/runs/${encodeURIComponent(runId)}`;

export const runPageKeys = {
  all: ['run-page'] as const,
  list: () => [...runPageKeys.all, 'list'] as const,
  detail: (runId: string) => [...runPageKeys.all, 'detail', runId] as const,
  overview: (runId: string) => [...runPageKeys.all, 'overview', runId] as const,
};

export const runPageQueries = {
  list: () =>
    queryOptions({
      queryKey: runPageKeys.list(),
      queryFn: ({ signal }) =>
        api.get<{ runs: RunView[] }>('/api/runs', signal).then((answer) => answer.runs),
    }),
  detail: (runId: string) =>
    queryOptions({
      queryKey: runPageKeys.detail(runId),
      queryFn: ({ signal }) =>
        api.get<{ run: RunDetail }>(runPath(runId), signal).then((answer) => answer.run),
    }),
  overview: (runId: string) =>
    queryOptions({
      queryKey: runPageKeys.overview(runId),
      queryFn: ({ signal }) => api.get<RunReviewView>(`${runPath(runId)}/review`, signal),
    }),
};

/** Every run this user may see (a skipper: their own vessels'). */
export const useRuns = () => useQuery(runPageQueries.list());

export const useRunDetail = (runId: string) => useQuery(runPageQueries.detail(runId));

export const useRunOverview = (runId: string) => useQuery(runPageQueries.overview(runId));

/** Where the browser downloads the signed-off run's certificate (a plain link saves the PDF). */
export const certificateUrl = (runId: string) => `${runPath(runId)}/certificate`;

const RANK: Partial<Record<RunView['state'], number>> = {
  planned: 2,
  'under-way': 2,
  submitted: 2,
  returned: 2,
  'signed-off': 1,
};

/**
 * For each engine, the run its "Run page" link opens: the open one, else the newest signed off.
 * A cancelled run was a mistake and gets no link.
 */
export function runPerEngine(runs: readonly RunView[]): Map<string, RunView> {
  const best = new Map<string, RunView>();
  for (const run of runs) {
    const rank = RANK[run.state];
    if (rank === undefined) continue;
    const seen = best.get(run.engine.id);
    const seenRank = seen ? RANK[seen.state]! : 0;
    if (rank > seenRank || (rank === seenRank && run.createdAt > seen!.createdAt))
      best.set(run.engine.id, run);
  }
  return best;
}
