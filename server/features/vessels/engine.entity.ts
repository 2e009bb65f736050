import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryColumn,
  Unique,
  UpdateDateColumn,
} from 'typeorm';
import type { EnginePosition } from '../../../shared/engines/engine.schema.js';
import { Vessel } from './vessel.entity.js';

@Entity('engine')
@Unique('UQ_engine_workshop_serial', ['workshopId', 'serialNumber'])
export class Engine {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  vesselId: string;

  @ManyToOne(() => Vessel, (vessel) => vessel.engines, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel?: Vessel;

  /** Copied from the vessel so serial numbers can be unique per workshop. */
  @Column('text')
  workshopId: string;

  @Column('text')
  position: EnginePosition;

  @Column('text')
  installation: 'outboard' | 'inboard' | 'sterndrive';

  @Column('text')
  maker: string;

  @Column('text')
  model: string;

  @Column('text')
  serialNumber: string;

  @Column({ type: 'real', nullable: true })
  ratedPowerKw: number | null;

  @Column('text')
  fuel: 'petrol' | 'diesel';

  @Column('text')
  cycle: 'two-stroke' | 'four-stroke';

  @Column({ type: 'integer' })
  ratedRpmMin: number;

  @Column({ type: 'integer' })
  ratedRpmMax: number;

  @Column({ type: 'real', nullable: true })
  gearRatio: number | null;

  @Column({ type: 'integer', nullable: true })
  propBlades: number | null;

  @Column({ type: 'real', nullable: true })
  propDiameterIn: number | null;

  @Column({ type: 'real', nullable: true })
  propPitchIn: number | null;

  @Column('text', { default: 'none' })
  tachSource: 'charging-coil' | 'belt-alternator' | 'ignition' | 'none';

  @Column({ type: 'integer', nullable: true })
  poles: number | null;

  @Column({ type: 'real', nullable: true })
  pulleyRatio: number | null;

  @Column({ type: 'real', nullable: true })
  hourMeterAtCommissioning: number | null;

  /** ISO date (YYYY-MM-DD), a calendar day in the workshop's zone. */
  @Column({ type: 'text', nullable: true })
  commissionedOn: string | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @Column({ type: 'datetime', nullable: true })
  archivedAt: Date | null;
}
