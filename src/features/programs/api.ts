import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { EngineKind, Program } from '../../../shared/programs/program.schema';
import type { ServiceInterval } from '../../../shared/service/service.schema';
import { api } from '../../lib/api-client';

export interface ProgramSummary {
  id: string;
  name: string;
  builtInKey: string | null;
  copiedFromId: string | null;
  retiredAt: string | null;
  suits: { engineKind: EngineKind; label: string };
  phaseCount: number;
  totalMinutes: number;
  firstService: ServiceInterval;
  updatedAt: string;
}

export interface ProgramDetail extends ProgramSummary {
  definition: Program;
}

export const programKeys = {
  all: ['programs'] as const,
  list: () => [...programKeys.all, 'list'] as const,
  detail: (id: string) => [...programKeys.all, 'detail', id] as const,
  copy: () => [...programKeys.all, 'copy'] as const,
  save: () => [...programKeys.all, 'save'] as const,
  retire: () => [...programKeys.all, 'retire'] as const,
  assign: () => [...programKeys.all, 'assign'] as const,
};

const path = (id: string) => `/api/programs/${encodeURIComponent(id)}`;

export const programQueries = {
  list: () =>
    queryOptions({
      queryKey: programKeys.list(),
      queryFn: ({ signal }) => api.get<{ programs: ProgramSummary[] }>('/api/programs', signal),
      select: (data) => data.programs,
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: programKeys.detail(id),
      queryFn: ({ signal }) => api.get<{ program: ProgramDetail }>(path(id), signal),
      select: (data) => data.program,
    }),
};

export const usePrograms = () => useQuery(programQueries.list());
export const useProgram = (id: string) => useQuery(programQueries.detail(id));

/** Every write answers with the program as stored: it replaces the cached one and the list refreshes. */
function useProgramWrite<TInput>(
  mutationKey: readonly unknown[],
  mutationFn: (input: TInput) => Promise<{ program: ProgramDetail }>,
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey,
    mutationFn,
    onSuccess: (data) => {
      queryClient.setQueryData(programKeys.detail(data.program.id), data);
      return queryClient.invalidateQueries({ queryKey: programKeys.list() });
    },
  });
}

export const useCopyProgram = () =>
  useProgramWrite(programKeys.copy(), (id: string) =>
    api.post<{ program: ProgramDetail }>(`${path(id)}/copy`),
  );

export const useSaveProgram = (id: string) =>
  useProgramWrite(programKeys.save(), (definition: Program) =>
    api.put<{ program: ProgramDetail }>(path(id), definition),
  );

export const useRetireProgram = () =>
  useProgramWrite(programKeys.retire(), (id: string) =>
    api.post<{ program: ProgramDetail }>(`${path(id)}/retire`),
  );

export const useReinstateProgram = () =>
  useProgramWrite(programKeys.retire(), (id: string) =>
    api.post<{ program: ProgramDetail }>(`${path(id)}/reinstate`),
  );

export const formatHours = (minutes: number) => `${Number((minutes / 60).toFixed(1))} h`;

export function formatInterval({ hours, months }: ServiceInterval): string {
  const parts = [
    hours !== undefined ? `${hours} h` : null,
    months !== undefined ? `${months} ${months === 1 ? 'month' : 'months'}` : null,
  ];
  return parts.filter(Boolean).join(' or ');
}
