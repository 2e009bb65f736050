import type { PhaseChart } from '../../../shared/review/chart-series.js';
import type { CertificateContent } from '../../../shared/review/certificate-content.js';
import { calendarDateIn } from '../../../shared/review/first-service.js';
import { isoTime } from '../../../shared/runs/event-time.js';
import type { RunContext } from '../runs/run-context.js';
import { commissionedEngineOf } from '../runs/run-engine.js';

const minutes = (ms: number) => Math.round(ms / 600) / 100;
const isoOrNull = isoTime;

/** Everything the certificate prints, taken from the run as it stands at sign-off. */
export function certificateContent(
  ctx: RunContext,
  charts: PhaseChart[],
  decision: {
    number: string;
    issuedAt: Date;
    comments: string;
    technician: { name: string; role: string };
  },
): CertificateContent {
  const { run, vessel, workshop, account } = ctx;
  return {
    number: decision.number,
    issuedAt: decision.issuedAt.toISOString(),
    issuedOn: calendarDateIn(workshop.timezone, decision.issuedAt),
    timezone: workshop.timezone,
    workshop: { name: workshop.name, address: workshop.address, email: workshop.email },
    vessel: { name: vessel.name, hin: vessel.hin, homePort: vessel.homePort },
    skippers: ctx.skippers.map((s) => s.name),
    engine: enginePart(ctx),
    program: { name: run.program.name, source: run.program.source },
    phases: phaseParts(ctx, charts),
    verdict: account.verdict,
    comments: decision.comments,
    technician: decision.technician,
    submittedAt: run.submittedAt?.toISOString() ?? null,
    voidedCount: ctx.figures.voidedCount,
    firstService: firstServicePart(ctx),
  };
}

function enginePart({ engine }: RunContext): CertificateContent['engine'] {
  const { id: _id, ...facts } = commissionedEngineOf(engine);
  return facts;
}

/** Each phase as it stands: its band, the times logged, its verdict and the reasons for it. */
function phaseParts(ctx: RunContext, charts: PhaseChart[]): CertificateContent['phases'] {
  return ctx.phases.map((phase, i) => {
    const a = ctx.account.phases[i];
    return {
      name: phase.name,
      performedBy: phase.performedBy,
      band: phase.band,
      throttleCeiling: phase.throttleCeiling,
      requiredMinutes: minutes(a.requiredMs),
      inBandMinutes: minutes(a.timeInBandMs),
      overMinutes: minutes(a.timeOverMs),
      underMinutes: minutes(a.timeUnderMs),
      verdict: a.verdict,
      firstAt: isoOrNull(charts[i].firstAt),
      lastAt: isoOrNull(charts[i].lastAt),
      reasons: a.reasons.map((r) => r.message),
      setAsideMinutes: minutes(a.setAsideMs),
    };
  });
}

function firstServicePart({ firstService }: RunContext): CertificateContent['firstService'] {
  return firstService
    ? {
        dueAtHours: firstService.dueAtHours,
        dueOn: firstService.dueOn,
        hoursNow: firstService.hoursNow,
        hoursSource: firstService.hoursSource,
      }
    : null;
}
