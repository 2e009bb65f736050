import type { RunRecord } from '../../../lib/db';

/** The run's own page in the workshop app: a plain link, a full page load (the deck has no router). */
export function RunPageLink({ run }: { run: Pick<RunRecord, 'id'> }) {
  return (
    <a
      href={`/runs/${encodeURIComponent(run.id)}`}
      className="inline-flex min-h-touch items-center font-semibold underline underline-offset-4"
    >
      Run page
    </a>
  );
}
