import type { DataSource } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type { RunReviewView } from '../../../shared/review/views.js';
import { CLOCK_SKEW_FLAG_MS } from '../../../shared/sync/sync.schema.js';
import type { Clock } from '../../lib/clock.js';
import { runTrail } from './run-trail.js';
import { Certificate } from '../signoff/certificate.entity.js';
import { RunReview } from '../signoff/run-review.entity.js';
import { loadRunContext, type RunContext } from '../runs/run-context.js';
import { commissionedEngineOf } from '../runs/run-engine.js';
import { RunFiguresCache } from '../runs/run-figures.js';

const iso = (d: Date | null) => d?.toISOString() ?? null;

export class ReviewService {
  private readonly figures: RunFiguresCache;

  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
  ) {
    this.figures = new RunFiguresCache(dataSource);
  }

  async review(user: SessionUser, runId: string): Promise<RunReviewView> {
    const ctx = await loadRunContext(this.dataSource, user, runId, this.clock.now(), this.figures);
    const reviews = await this.dataSource
      .getRepository(RunReview)
      .find({ where: { runId }, order: { decidedAt: 'ASC' } });
    const certificate = await this.dataSource
      .getRepository(Certificate)
      .findOne({ where: { runId } });
    const staff = user.role !== 'skipper';
    return {
      run: runPart(ctx),
      vessel: {
        id: ctx.vessel.id,
        name: ctx.vessel.name,
        hin: ctx.vessel.hin,
        homePort: ctx.vessel.homePort,
      },
      engine: commissionedEngineOf(ctx.engine),
      skippers: ctx.skippers.map(({ id, name }) => ({ id, name })),
      account: {
        verdict: ctx.account.verdict,
        overallProgress: ctx.account.overallProgress,
        sessionMs: ctx.account.sessionMs,
        unassignedMs: ctx.account.unassignedMs,
      },
      phases: phaseViews(ctx),
      charts: ctx.charts,
      events: ctx.figures.events,
      eventsTotal: ctx.figures.eventsTotal,
      readingCount: ctx.figures.readingCount,
      voidedCount: ctx.figures.voidedCount,
      ...decisions(ctx, reviews, certificate),
      firstService: ctx.firstService,
      trail: staff ? await runTrail(this.dataSource, ctx.run) : [],
      canDecide: staff && ctx.run.state === 'submitted',
    };
  }
}

function runPart({ run }: RunContext) {
  const skew = run.clockSkewMs;
  return {
    id: run.id,
    state: run.state,
    programName: run.program.name,
    programSource: run.program.source,
    notes: run.notes,
    currentPhaseId: run.currentPhaseId,
    createdAt: run.createdAt.toISOString(),
    submittedAt: iso(run.submittedAt),
    submitNote: run.submitNote,
    signedOffAt: iso(run.signedOffAt),
    lastEventAt: run.lastEventAt,
    clockSkewMs: skew,
    clockSkewFlag: skew !== null && Math.abs(skew) > CLOCK_SKEW_FLAG_MS,
  };
}

/** Each phase with its band and rules, the times the accounting gave it, and when it was run. */
function phaseViews(ctx: RunContext): RunReviewView['phases'] {
  return ctx.phases.map((phase, i) => {
    const a = ctx.account.phases[i];
    const { firstAt, lastAt } = ctx.charts[i];
    return {
      id: phase.id,
      name: phase.name,
      performedBy: phase.performedBy,
      throttleCeiling: phase.throttleCeiling,
      band: phase.band,
      rules: phase.rules,
      requiredMs: a.requiredMs,
      timeInBandMs: a.timeInBandMs,
      timeOverMs: a.timeOverMs,
      timeUnderMs: a.timeUnderMs,
      longestFullThrottleMs: a.longestFullThrottleMs,
      progressShare: a.progressShare,
      setAsideMs: a.setAsideMs,
      countsFromMs: a.countsFromMs,
      verdict: a.verdict,
      reasons: a.reasons,
      firstAt,
      lastAt,
    };
  });
}

/** The workshop's decisions so far, oldest first, and the certificate if one was issued. */
function decisions(
  { run }: RunContext,
  reviews: RunReview[],
  certificate: Certificate | null,
): Pick<RunReviewView, 'reviews' | 'certificate'> {
  return {
    reviews: reviews.map((r) => ({
      decision: r.decision,
      comments: r.comments,
      rerunPhaseNames: r.rerunPhaseIds.map(
        (id) => run.program.phases.find((p) => p.id === id)?.name ?? id,
      ),
      verdict: r.verdict,
      reviewerName: r.reviewerName,
      decidedAt: r.decidedAt.toISOString(),
    })),
    certificate: certificate
      ? {
          number: certificate.number,
          issuedAt: certificate.issuedAt.toISOString(),
          downloadUrl: `/api/runs/${run.id}/certificate`,
        }
      : null,
  };
}
