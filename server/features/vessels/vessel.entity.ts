import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  OneToMany,
  PrimaryColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { VesselType } from '../../../shared/vessels/vessel.schema.js';
import { Workshop } from '../workshops/workshop.entity.js';
// The children name their vessel; the vessel names them by entity name and imports only their
// types, so the entity modules form no import cycle.
import type { Engine } from './engine.entity.js';
import type { VesselSkipper } from './vessel-skipper.entity.js';

@Entity('vessel')
export class Vessel {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  workshopId: string;

  @ManyToOne(() => Workshop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'workshopId' })
  workshop?: Workshop;

  @Column('text')
  name: string;

  /** Hull identification number; empty when not known yet. */
  @Column('text', { default: '' })
  hin: string;

  @Column('text')
  type: VesselType;

  @Column({ type: 'real', nullable: true })
  lengthM: number | null;

  @Column('text', { default: '' })
  homePort: string;

  @OneToMany('Engine', (engine: Engine) => engine.vessel)
  engines?: Engine[];

  @OneToMany('VesselSkipper', (link: VesselSkipper) => link.vessel)
  skippers?: VesselSkipper[];

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @Column({ type: 'datetime', nullable: true })
  archivedAt: Date | null;
}
