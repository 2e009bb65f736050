import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { Run } from '../runs/run.entity.js';

/** One decision on a submitted run: confirmed (signed off) or returned with comments. A run may be returned several times. */
@Entity('run_review')
export class RunReview {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  runId: string;

  @ManyToOne(() => Run, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'runId' })
  run?: Run;

  @Column('text')
  workshopId: string;

  @Column('text')
  decision: 'confirmed' | 'returned';

  @Column('text', { default: '' })
  comments: string;

  /** The phases sent back to be run again (program phase ids); empty when confirmed. */
  @Column('simple-json', { default: '[]' })
  rerunPhaseIds: string[];

  /** The computation's verdict at the moment of the decision. */
  @Column('text')
  verdict: string;

  @Column('text')
  reviewerId: string;

  @Column('text')
  reviewerName: string;

  @Column({ type: 'datetime' })
  decidedAt: Date;
}
