import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, Unique } from 'typeorm';
import { Engine } from '../vessels/engine.entity.js';

/**
 * A service the workshop did on an engine. Only the first service ('first') for now: recording
 * it stops the first-service reminders and starts the count to the next service. One per engine
 * and kind; a record is never edited (a mistake stays visible in the audit trail).
 */
@Entity('service_record')
@Unique('UQ_service_record_engine_kind', ['engineId', 'kind'])
export class ServiceRecord {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  workshopId: string;

  @Column('text')
  engineId: string;

  @ManyToOne(() => Engine, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'engineId' })
  engine?: Engine;

  @Column('text')
  kind: string;

  /** The calendar day of the service in the workshop's zone, YYYY-MM-DD. */
  @Column('text')
  doneOn: string;

  @Column('real')
  hourMeter: number;

  /** The person who did the work, as typed: not always a user of the app. */
  @Column('text')
  doneBy: string;

  @Column('text', { default: '' })
  notes: string;

  @Column('text')
  recordedById: string;

  @Column('text')
  recordedByName: string;

  @Column({ type: 'datetime' })
  recordedAt: Date;
}
