import { Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { User } from '../users/user.entity.js';
import { Vessel } from './vessel.entity.js';

/** Which skippers may see and log a vessel. */
@Entity('vessel_skipper')
export class VesselSkipper {
  @PrimaryColumn('text')
  vesselId: string;

  @PrimaryColumn('text')
  userId: string;

  @ManyToOne(() => Vessel, (vessel) => vessel.skippers, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel?: Vessel;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'userId' })
  user?: User;
}
