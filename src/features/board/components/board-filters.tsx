import { RUN_STATE_WORDS } from '../../../../shared/review/run-words';
import type { BoardShow } from '../../../../shared/review/review.schema';
import { RUN_STATES, type RunState } from '../../../../shared/runs/run.schema';
import { cx } from '../../../components/ui/cx';
import { SelectField, TextField } from '../../../components/ui/field';

type Choice = [BoardShow, string, number];

/** Wide screens: one toggle button per choice, each with how many runs it holds. */
function ShowButtons({
  choices,
  show,
  onShow,
}: {
  choices: Choice[];
  show: BoardShow;
  onShow: (show: BoardShow) => void;
}) {
  return (
    <div role="group" aria-label="Show runs" className="hidden flex-wrap gap-2 sm:flex">
      {choices.map(([value, label, count]) => (
        <button
          key={value}
          type="button"
          aria-pressed={show === value}
          onClick={() => onShow(value)}
          className={cx(
            'inline-flex min-h-touch items-center gap-2 rounded-md border-2 border-ink px-3 font-semibold',
            show === value ? 'bg-ink text-paper' : 'bg-surface text-ink',
          )}
        >
          {label}
          <span className="figures rounded-full border-2 border-current px-1.5 text-sm">
            {count}
          </span>
        </button>
      ))}
    </div>
  );
}

interface BoardFiltersProps {
  show: BoardShow;
  counts: Record<RunState, number>;
  actionCount: number;
  total: number;
  q: string;
  onShow: (show: BoardShow) => void;
  onSearch: (q: string) => void;
}

/**
 * The choice of runs: a row of toggle buttons, each saying how many runs it holds, on wide
 * screens; one list on phones, where seven buttons would push the runs off the screen.
 */
export function BoardFilters({
  show,
  counts,
  actionCount,
  total,
  q,
  onShow,
  onSearch,
}: BoardFiltersProps) {
  const choices: Choice[] = [
    ['action', 'Needs action', actionCount],
    ['all', 'All', total],
    ...RUN_STATES.map((s): Choice => [s, RUN_STATE_WORDS[s], counts[s]]),
  ];
  return (
    <div className="flex flex-col gap-3 sm:flex-row sm:flex-wrap sm:items-end sm:gap-4">
      <ShowButtons choices={choices} show={show} onShow={onShow} />
      <div className="sm:hidden">
        <SelectField
          label="Show"
          value={show}
          onChange={(e) => onShow(e.target.value as BoardShow)}
        >
          {choices.map(([value, label, count]) => (
            <option key={value} value={value}>
              {label} ({count})
            </option>
          ))}
        </SelectField>
      </div>
      <div className="w-full max-w-md">
        <TextField
          label="Search runs"
          hint="Vessel, engine, serial number or program"
          type="search"
          value={q}
          onChange={(e) => onSearch(e.target.value)}
        />
      </div>
    </div>
  );
}
