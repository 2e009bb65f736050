import type { FirstServiceView } from '../../../../shared/review/first-service';
import { formatDate, formatHours } from '../../../lib/format';

/** "Due at 21.0 engine hours or on 12 Jun 2026, whichever comes first." */
export function firstServiceDueWords(service: FirstServiceView): string {
  const hours =
    service.dueAtHours === null ? null : `at ${formatHours(service.dueAtHours)} engine hours`;
  const date = service.dueOn === null ? null : `on ${formatDate(service.dueOn)}`;
  if (hours && date) return `Due ${hours} or ${date}, whichever comes first.`;
  return `Due ${hours ?? date ?? 'when the workshop says'}.`;
}

const STATE_WORDS: Record<FirstServiceView['state'], string | null> = {
  overdue: 'Overdue: book it with the workshop now.',
  'due-soon': 'Due soon: book it with the workshop.',
  'not-due': null,
};

/** The first service after the break-in: when it falls due, and the engine hours it was worked from. */
export function FirstService({ service }: { service: FirstServiceView | null }) {
  if (!service)
    return <p>The first service is not worked out yet: the workshop records the commissioning.</p>;
  const state = STATE_WORDS[service.state];
  return (
    <div className="flex flex-col gap-1">
      <p className="font-semibold">{firstServiceDueWords(service)}</p>
      {state && (
        <p className="font-bold">
          <span aria-hidden="true">⚑ </span>
          {state}
        </p>
      )}
      <p className="text-sm text-muted">
        The engine has <span className="figures">{formatHours(service.hoursNow)}</span> hours now
        {service.hoursSource === 'logged'
          ? ', from the hour meter last logged.'
          : ': an estimate, the hour meter at commissioning plus the running time logged.'}
      </p>
    </div>
  );
}
