import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { RpmBand } from '../../../shared/programs/phase-band.schema.js';
import type { Program as ProgramDefinition } from '../../../shared/programs/program.schema.js';
import type { RunState } from '../../../shared/runs/run.schema.js';
import type { RunDecisionView } from '../../../shared/runs/run-view.js';
import { Engine } from '../vessels/engine.entity.js';

/**
 * One engine's break-in. `program` and `bands` are frozen copies taken at assignment: later
 * edits to the template or the engine's rating never change what this run is judged against.
 */
@Entity('run')
export class Run {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  workshopId: string;

  @Index()
  @Column('text')
  engineId: string;

  @ManyToOne(() => Engine, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'engineId' })
  engine?: Engine;

  @Column('text')
  vesselId: string;

  @Column('text')
  programId: string;

  @Column('simple-json')
  program: ProgramDefinition;

  /** Each phase's band in rpm for this engine, by phase id. */
  @Column('simple-json')
  bands: Record<string, RpmBand>;

  @Index()
  @Column('text')
  state: RunState;

  @Column('text')
  assignedById: string;

  /** The phase the crew is on, as last set by a device or the workshop (last writer wins). */
  @Column({ type: 'text', nullable: true })
  currentPhaseId: string | null;

  /** Free notes on the run, shared by skipper and workshop (last writer wins, see DEVELOPERS.md). */
  @Column('text', { default: '' })
  notes: string;

  /** Largest gap seen between a device's clock and the server's on arrival, in ms (signed: + means device ahead). */
  @Column({ type: 'integer', nullable: true })
  clockSkewMs: number | null;

  /** Device time of the newest event, epoch ms. */
  @Column({ type: 'integer', nullable: true })
  lastEventAt: number | null;

  /** Change number of the last change to this row (see change_counter). */
  @Index()
  @Column({ type: 'integer', default: 0 })
  seq: number;

  @Column({ type: 'datetime', nullable: true })
  submittedAt: Date | null;

  /** The skipper's note on submitting with a phase not complete. */
  @Column({ type: 'text', nullable: true })
  submitNote: string | null;

  /**
   * For each phase the workshop sent back, the moment it did (epoch ms, latest return wins): the
   * re-run rule in shared/runs/phase-tally.ts counts the phase only from then.
   */
  @Column('simple-json', { default: '{}' })
  rerunFrom: Record<string, number>;

  /** The latest decision on the run (also in run_review, which keeps every one). */
  @Column('simple-json', { nullable: true })
  lastDecision: RunDecisionView | null;

  @Column({ type: 'text', nullable: true })
  certificateNumber: string | null;

  @Column({ type: 'datetime', nullable: true })
  signedOffAt: Date | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;
}
