import { Link } from 'react-router-dom';
import { ENGINE_KIND_WORDS } from '../../../../shared/programs/program-words';
import { Button } from '../../../components/ui/button';
import { Pill } from '../../../components/ui/pill';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatHours, formatInterval, type ProgramSummary } from '../api';

interface ProgramsTableProps {
  programs: ProgramSummary[];
  canManage: boolean;
  busy: boolean;
  onCopy: (id: string) => void;
  onRetire: (id: string, retire: boolean) => void;
}

export function ProgramMarks({
  program,
}: {
  program: Pick<ProgramSummary, 'builtInKey' | 'retiredAt'>;
}) {
  return (
    <span className="flex flex-wrap gap-1">
      {program.builtInKey && <Pill tone="solid">Built-in</Pill>}
      {program.retiredAt && <Pill tone="quiet">Retired</Pill>}
    </span>
  );
}

function RowActions({
  program,
  busy,
  onCopy,
  onRetire,
}: Omit<ProgramsTableProps, 'programs' | 'canManage'> & { program: ProgramSummary }) {
  return (
    <div className="flex flex-wrap gap-2">
      <Button
        variant="secondary"
        disabled={busy}
        aria-label={`Copy ${program.name}`}
        onClick={() => onCopy(program.id)}
      >
        Copy
      </Button>
      <Button
        variant="secondary"
        disabled={busy}
        aria-label={`${program.retiredAt ? 'Reinstate' : 'Retire'} ${program.name}`}
        onClick={() => onRetire(program.id, !program.retiredAt)}
      >
        {program.retiredAt ? 'Reinstate' : 'Retire'}
      </Button>
    </div>
  );
}

const nameLink = (program: ProgramSummary) => (
  <Link
    to={`/programs/${program.id}`}
    className="flex min-h-touch items-center font-semibold underline underline-offset-4"
  >
    {program.name}
  </Link>
);

/** Cards on phones, a table on wider screens; only one of the two is shown (and read out) at a time. */
export function ProgramsTable(props: ProgramsTableProps) {
  const { programs, canManage } = props;
  return (
    <>
      <ul className="flex flex-col gap-3 sm:hidden">
        {programs.map((program) => (
          <li key={program.id} className="rounded-lg border-2 border-line bg-surface p-4">
            {nameLink(program)}
            <ProgramMarks program={program} />
            <p className="mt-1">{ENGINE_KIND_WORDS[program.suits.engineKind]}</p>
            <p className="figures">
              {program.phaseCount} phases · {formatHours(program.totalMinutes)}
            </p>
            <p className="mb-2">First service {formatInterval(program.firstService)}</p>
            {canManage && <RowActions program={program} {...props} />}
          </li>
        ))}
      </ul>
      <div className="hidden sm:block">
        <WideTable {...props} />
      </div>
    </>
  );
}

function WideTable({ programs, canManage, ...actions }: ProgramsTableProps) {
  return (
    <Table>
      <thead>
        <tr>
          <Th>Program</Th>
          <Th>Engine kind</Th>
          <Th>Phases</Th>
          <Th>Total</Th>
          <Th>First service</Th>
          {canManage && (
            <Th>
              <span className="sr-only">Actions</span>
            </Th>
          )}
        </tr>
      </thead>
      <tbody>
        {programs.map((program) => (
          <tr key={program.id}>
            <Td>
              {nameLink(program)}
              <ProgramMarks program={program} />
            </Td>
            <Td>{ENGINE_KIND_WORDS[program.suits.engineKind]}</Td>
            <Td className="figures">{program.phaseCount}</Td>
            <Td className="figures">{formatHours(program.totalMinutes)}</Td>
            <Td>{formatInterval(program.firstService)}</Td>
            {canManage && (
              <Td>
                <RowActions program={program} {...actions} />
              </Td>
            )}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
