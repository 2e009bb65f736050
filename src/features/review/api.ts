import type { VoidInput } from '../../../shared/review/review.schema';
import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from '@tanstack/react-query';
import type { SignOffInput, VesselDecisionsInput } from '../../../shared/review/review.schema';
import type { DecisionView, ReadingsPage, RunReviewView } from '../../../shared/review/views';
import { api } from '../../lib/api-client';

export const reviewKeys = {
  all: ['review'] as const,
  detail: (runId: string) => [...reviewKeys.all, 'detail', runId] as const,
  readings: (runId: string, offset: number, limit: number) =>
    [...reviewKeys.all, 'readings', runId, offset, limit] as const,
  decide: (runId: string) => [...reviewKeys.all, 'decide', runId] as const,
};

export const reviewQueries = {
  detail: (runId: string) =>
    queryOptions({
      queryKey: reviewKeys.detail(runId),
      queryFn: ({ signal }) =>
        api.get<RunReviewView>(`/api/runs/${encodeURIComponent(runId)}/review`, signal),
    }),
  readings: (runId: string, offset: number, limit: number) =>
    queryOptions({
      queryKey: reviewKeys.readings(runId, offset, limit),
      queryFn: ({ signal }) =>
        api.get<ReadingsPage>(
          `/api/runs/${encodeURIComponent(runId)}/readings?offset=${offset}&limit=${limit}`,
          signal,
        ),
      placeholderData: keepPreviousData,
    }),
};

/** Everything the review page shows of one run: accounting, charts, events, decisions, trail. */
export const useRunReview = (runId: string) => useQuery(reviewQueries.detail(runId));

export const useReadings = (runId: string, offset: number, limit: number) =>
  useQuery(reviewQueries.readings(runId, offset, limit));

/** Where the browser downloads the readings as CSV (a plain link: the browser saves the file). */
export const readingsCsvUrl = (runId: string) =>
  `/api/runs/${encodeURIComponent(runId)}/readings.csv`;

/**
 * Confirms (signs off) or returns a submitted run. `onDecided` hears the answer before the review
 * is refreshed: the refreshed review no longer shows the form, so a per-call callback would be lost.
 */
export function useSignOff(runId: string, onDecided?: (result: DecisionView) => unknown) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: reviewKeys.decide(runId),
    mutationFn: (input: SignOffInput) =>
      api.post<DecisionView>(`/api/runs/${encodeURIComponent(runId)}/sign-off`, input),
    onSuccess: async (result) => {
      await onDecided?.(result);
      await queryClient.invalidateQueries({ queryKey: reviewKeys.all });
    },
  });
}

/** A technician takes back a reading from the review page, with a reason (kept in the trail). */
export function useVoidEntry(runId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: VoidInput) =>
      api.post<{ id: string }>(`/api/runs/${encodeURIComponent(runId)}/voids`, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
  });
}

export type VesselDecisionView = DecisionView & { runId: string };

/** Decides the submitted runs of one vessel together (both engines of a twin): all or none. */
export function useVesselDecisions(vesselId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: VesselDecisionsInput) =>
      api.post<{ decisions: VesselDecisionView[] }>(
        `/api/vessels/${encodeURIComponent(vesselId)}/decisions`,
        input,
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
  });
}
