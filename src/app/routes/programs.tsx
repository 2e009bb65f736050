import { useNavigate } from 'react-router-dom';
import {
  useCopyProgram,
  usePrograms,
  useReinstateProgram,
  useRetireProgram,
} from '../../features/programs/api';
import { ProgramsTable } from '../../features/programs/components/programs-table';
import { Alert } from '../../components/ui/alert';
import { LoadError, Loading } from '../../components/ui/status-message';
import { errorMessage } from '../../lib/api-client';
import { useSessionUser } from '../shell/session';
import { StaffOnly } from './staff-only';

function ProgramsPage() {
  const user = useSessionUser();
  const programs = usePrograms();
  const copy = useCopyProgram();
  const retire = useRetireProgram();
  const reinstate = useReinstateProgram();
  const navigate = useNavigate();
  const failed = copy.error ?? retire.error ?? reinstate.error;
  const onCopy = (id: string) =>
    copy.mutate(id, { onSuccess: (data) => navigate(`/programs/${data.program.id}`) });
  const onRetire = (id: string, retiring: boolean) =>
    retiring ? retire.mutate(id) : reinstate.mutate(id);

  return (
    <div className="flex flex-col gap-5">
      <title>Break-in programs · Ringseat</title>
      <h1 className="text-3xl font-bold">Break-in programs</h1>
      <p className="max-w-prose">
        Built-in programs are written from common practice. The engine maker&rsquo;s manual comes
        first: where it says otherwise, copy a program and change it to match.
        {user.role === 'manager'
          ? ' Copy a program to edit it; retire one to stop it being assigned.'
          : ''}
      </p>
      {failed && <Alert title="That did not work">{errorMessage(failed)}</Alert>}
      {programs.isPending && <Loading label="Loading programs…" />}
      {programs.isError && (
        <LoadError error={programs.error} what="the programs" onRetry={() => programs.refetch()} />
      )}
      {programs.data && (
        <ProgramsTable
          programs={programs.data}
          canManage={user.role === 'manager'}
          onCopy={onCopy}
          onRetire={onRetire}
          busy={copy.isPending || retire.isPending || reinstate.isPending}
        />
      )}
    </div>
  );
}

export function ProgramsRoute() {
  return (
    <StaffOnly title="Break-in programs">
      <ProgramsPage />
    </StaffOnly>
  );
}

export { ProgramsRoute as Component };
