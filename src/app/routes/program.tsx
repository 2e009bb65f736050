import { Link, useNavigate, useParams } from 'react-router-dom';
import { ENGINE_KIND_WORDS } from '../../../shared/programs/program-words';
import { useCopyProgram, useProgram, type ProgramDetail } from '../../features/programs/api';
import { ProgramForm } from '../../features/programs/components/program-form';
import { ProgramView } from '../../features/programs/components/program-view';
import { ProgramMarks } from '../../features/programs/components/programs-table';
import { Alert } from '../../components/ui/alert';
import { Button } from '../../components/ui/button';
import { LoadError, Loading } from '../../components/ui/status-message';
import { errorMessage } from '../../lib/api-client';
import { useSessionUser } from '../shell/session';
import { StaffOnly } from './staff-only';

function ReadOnlyNote({ program, isManager }: { program: ProgramDetail; isManager: boolean }) {
  const copy = useCopyProgram();
  const navigate = useNavigate();
  if (!isManager) return null;
  return (
    <div className="flex flex-col gap-2">
      <p>
        {program.builtInKey
          ? 'Built-in programs cannot be changed. Copy it to make your own version.'
          : 'Retired programs cannot be changed.'}
      </p>
      {program.builtInKey && (
        <Button
          className="self-start"
          pending={copy.isPending}
          pendingLabel="Copying…"
          onClick={() =>
            copy.mutate(program.id, {
              onSuccess: (data) => navigate(`/programs/${data.program.id}`),
            })
          }
        >
          Copy to edit
        </Button>
      )}
      {copy.isError && <Alert title="The program was not copied">{errorMessage(copy.error)}</Alert>}
    </div>
  );
}

function ProgramPage({ id }: { id: string }) {
  const user = useSessionUser();
  const program = useProgram(id);
  if (program.isPending) return <Loading label="Loading the program…" />;
  if (program.isError)
    return <LoadError error={program.error} what="the program" onRetry={() => program.refetch()} />;
  const p = program.data;
  const editable = user.role === 'manager' && !p.builtInKey && !p.retiredAt;
  return (
    <div className="flex flex-col gap-5">
      <title>{`${p.name} · Ringseat`}</title>
      <Link
        to="/programs"
        className="flex min-h-touch items-center self-start underline underline-offset-4"
      >
        ← Break-in programs
      </Link>
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-3xl font-bold">{p.name}</h1>
        <ProgramMarks program={p} />
      </div>
      <p>
        For: {ENGINE_KIND_WORDS[p.suits.engineKind]}
        {p.suits.label ? ` · ${p.suits.label}` : ''}
      </p>
      <p className="max-w-prose text-sm">
        Run engines only with the kill-switch lanyard attached, good ventilation and cooling water
        flowing. The engine maker&rsquo;s manual, local rules and licensed technicians come before
        this program.
      </p>
      {editable ? (
        <ProgramForm program={p} />
      ) : (
        <>
          <ReadOnlyNote program={p} isManager={user.role === 'manager'} />
          <ProgramView definition={p.definition} />
        </>
      )}
    </div>
  );
}

export function ProgramRoute() {
  const { id = '' } = useParams();
  return (
    <StaffOnly title="Break-in program">
      <ProgramPage key={id} id={id} />
    </StaffOnly>
  );
}

export { ProgramRoute as Component };
