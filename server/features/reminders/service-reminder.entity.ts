import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, Unique } from 'typeorm';
import { Engine } from '../vessels/engine.entity.js';

/** A service reminder that went out; one per engine and kind, so each is sent once. */
@Entity('service_reminder')
@Unique('UQ_service_reminder_engine_kind', ['engineId', 'kind'])
export class ServiceReminder {
  @PrimaryColumn('text')
  id: string;

  @Column('text')
  workshopId: string;

  @Column('text')
  engineId: string;

  @ManyToOne(() => Engine, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'engineId' })
  engine?: Engine;

  /** 'first-service' for now. */
  @Column('text')
  kind: string;

  /** The state that triggered it: 'due-soon' or 'overdue'. */
  @Column('text')
  state: string;

  @Column({ type: 'real', nullable: true })
  dueAtHours: number | null;

  @Column({ type: 'text', nullable: true })
  dueOn: string | null;

  @Column({ type: 'datetime' })
  sentAt: Date;

  @Column('simple-json')
  recipients: string[];
}
