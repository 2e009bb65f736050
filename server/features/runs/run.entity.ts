import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { RpmBand } from '../../../shared/programs/phase-band.schema.js';
import type { Program as ProgramDefinition } from '../../../shared/programs/program.schema.js';
import type { RunState } from '../../../shared/runs/run.schema.js';
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

  @Column({ type: 'datetime', nullable: true })
  submittedAt: Date | null;

  @Column({ type: 'datetime', nullable: true })
  signedOffAt: Date | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;
}
