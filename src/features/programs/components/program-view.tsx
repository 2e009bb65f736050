import type { Phase, Program } from '../../../../shared/programs/program.schema';
import {
  bandWords,
  CEILING_WORDS,
  PERFORMED_BY_WORDS,
} from '../../../../shared/programs/program-words';
import { Card } from '../../../components/ui/card';
import { formatInterval } from '../api';

function rulesText({ rules }: Phase): string[] {
  return [
    rules.changeSpeedEveryMinutes !== undefined &&
      `Change speed at least every ${rules.changeSpeedEveryMinutes} min`,
    rules.fullThrottleMaxSeconds !== undefined &&
      `Full throttle at most ${rules.fullThrottleMaxSeconds} s at a time`,
    rules.fullThrottleMaxMinutesPerHour !== undefined &&
      `At most ${rules.fullThrottleMaxMinutesPerHour} min of full throttle in any hour`,
    rules.idleMaxMinutes !== undefined && `Idle at most ${rules.idleMaxMinutes} min at a time`,
  ].filter((rule): rule is string => Boolean(rule));
}

/** A program as the workshop reads it: built-in programs and retired ones are shown, not edited. */
export function ProgramView({ definition }: { definition: Program }) {
  return (
    <div className="flex flex-col gap-4">
      <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[auto_1fr]">
        <dt className="font-semibold">First service</dt>
        <dd>{formatInterval(definition.firstService)}, whichever comes first</dd>
        <dt className="font-semibold">Source</dt>
        <dd>{definition.source}</dd>
      </dl>
      {definition.notes && <p className="whitespace-pre-line">{definition.notes}</p>}
      <ol className="flex flex-col gap-3">
        {definition.phases.map((phase, index) => (
          <li key={phase.id}>
            <Card title={`${index + 1}. ${phase.name}`} level={3}>
              <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[auto_1fr]">
                <dt className="font-semibold">Performed by</dt>
                <dd>{PERFORMED_BY_WORDS[phase.performedBy]}</dd>
                <dt className="font-semibold">Required time in band</dt>
                <dd className="figures">{phase.requiredMinutes} min</dd>
                <dt className="font-semibold">Throttle ceiling</dt>
                <dd>{CEILING_WORDS[phase.throttleCeiling]}</dd>
                <dt className="font-semibold">Band</dt>
                <dd className="figures">{bandWords(phase.band)}</dd>
              </dl>
              {rulesText(phase).length > 0 && (
                <ul className="mt-2 list-disc pl-5">
                  {rulesText(phase).map((r) => (
                    <li key={r}>{r}</li>
                  ))}
                </ul>
              )}
              <p className="mt-2 whitespace-pre-line">{phase.instructions}</p>
            </Card>
          </li>
        ))}
      </ol>
    </div>
  );
}
