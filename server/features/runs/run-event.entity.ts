import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { Run } from './run.entity.js';

/**
 * Everything logged during a run (session start/stop, readings, phase advances, alerts, notes),
 * append-only. The id is the UUID the device made, so a copy sent twice is recognised.
 * `at` is the device's clock; `receivedAt` the server's, kept beside it to spot clock skew.
 */
@Entity('run_event')
@Index('IDX_run_event_run_at', ['runId', 'at'])
export class RunEventRow {
  @PrimaryColumn('text')
  id: string;

  @Column('text')
  runId: string;

  @ManyToOne(() => Run, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'runId' })
  run?: Run;

  /** Kept for tenancy checks on a row; not indexed (nothing reads events by workshop alone). */
  @Column('text')
  workshopId: string;

  @Column('text')
  engineId: string;

  @Column('text')
  kind: string;

  /** Device time, epoch milliseconds. */
  @Column({ type: 'integer' })
  at: number;

  /** Server time of arrival, epoch milliseconds. */
  @Column({ type: 'integer' })
  receivedAt: number;

  /** Who sent it (the signed-in user). */
  @Column('text')
  authorId: string;

  @Column({ type: 'text', nullable: true })
  phaseId: string | null;

  @Column({ type: 'real', nullable: true })
  rpm: number | null;

  @Column({ type: 'text', nullable: true })
  throttle: string | null;

  /** The whole event as the device sent it, after validation (the fields above are copies for queries). */
  @Column('simple-json')
  body: Record<string, unknown>;

  /** Change number for pull: strictly increasing across the whole database. */
  @Index()
  @Column({ type: 'integer' })
  seq: number;
}
