import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { Run } from '../runs/run.entity.js';

/**
 * What the runs board shows of a run's accounting, kept so the board need not account every
 * run's events on each visit. `eventSeq` is the newest event change number folded in; events
 * are append-only and numbered in commit order, so anything newer means "account again".
 */
@Entity('run_summary')
export class RunSummary {
  @PrimaryColumn('text')
  runId: string;

  @ManyToOne(() => Run, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'runId' })
  run?: Run;

  @Index()
  @Column('text')
  workshopId: string;

  @Column({ type: 'integer' })
  eventSeq: number;

  /** Copied from the run's frozen program, so the board reads no program JSON. */
  @Column('text')
  programName: string;

  @Column({ type: 'real', nullable: true })
  serviceHours: number | null;

  @Column({ type: 'integer', nullable: true })
  serviceMonths: number | null;

  @Column('text')
  verdict: string;

  /** Required time done, 0..1. */
  @Column('real')
  progress: number;

  @Column({ type: 'integer' })
  breachCount: number;

  /** First phase not yet complete, by the accounting; null when all are. */
  @Column({ type: 'text', nullable: true })
  openPhaseName: string | null;

  @Column({ type: 'integer' })
  sessionMs: number;

  /** Newest hour meter logged with a reading, and its device time. */
  @Column({ type: 'real', nullable: true })
  hourMeter: number | null;

  @Column({ type: 'integer', nullable: true })
  hourMeterAt: number | null;
}

/** Per workshop: every event up to this change number is folded into the summaries. */
@Entity('run_summary_mark')
export class RunSummaryMark {
  @PrimaryColumn('text')
  workshopId: string;

  @Column({ type: 'integer' })
  eventSeq: number;
}
