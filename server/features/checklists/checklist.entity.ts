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
import type { ChecklistInput } from '../../../shared/checklists/checklist.schema.js';
import type { ChecklistEvaluation } from '../../../shared/checklists/evaluate-checklist.js';
import { Engine } from '../vessels/engine.entity.js';

/** One engine's commissioning checklist, filled in at handover; saved part-done until completed. */
@Entity('commissioning_checklist')
export class CommissioningChecklist {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  workshopId: string;

  /** One checklist per engine. */
  @Index({ unique: true })
  @Column('text')
  engineId: string;

  @ManyToOne(() => Engine, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'engineId' })
  engine?: Engine;

  @Column('simple-json')
  entries: ChecklistInput;

  /**
   * The evaluation as of the last save. Once completed it is the record of what was judged at
   * handover, even if the engine's ratings are edited later.
   */
  @Column('simple-json')
  evaluation: ChecklistEvaluation;

  @Column('text')
  updatedById: string;

  @Column({ type: 'datetime', nullable: true })
  completedAt: Date | null;

  @Column({ type: 'text', nullable: true })
  completedById: string | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;
}
