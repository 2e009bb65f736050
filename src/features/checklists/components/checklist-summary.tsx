import type { ChecklistSummary } from '../../../../shared/checklists/evaluate-checklist';
import { VerdictPill } from './verdict';

/** Where the checklist stands, in counts with the same marks as the items. */
export function ChecklistSummaryBar({ summary }: { summary: ChecklistSummary }) {
  const parts = [
    { verdict: 'pass', count: summary.passed },
    { verdict: 'fail', count: summary.failed },
    { verdict: 'open', count: summary.open },
    { verdict: 'not-applicable', count: summary.notApplicable },
  ] as const;
  return (
    <div role="status" aria-label="Checklist progress" className="flex flex-col gap-2">
      <ul className="flex flex-wrap gap-2">
        {parts.map(({ verdict, count }) => (
          <li key={verdict} className="flex items-center gap-1">
            <VerdictPill verdict={verdict} />
            <span className="figures text-lg font-bold">{count}</span>
          </li>
        ))}
      </ul>
      <p className="font-semibold">
        {summary.readyToComplete
          ? 'Every item is done: the checklist can be completed.'
          : `${summary.failed + summary.open} of ${summary.total} items still need attention before the checklist can be completed.`}
      </p>
    </div>
  );
}
