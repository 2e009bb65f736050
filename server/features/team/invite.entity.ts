import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryColumn,
} from 'typeorm';
import type { Role } from '../../../shared/auth/auth.schema.js';
import { Workshop } from '../workshops/workshop.entity.js';

/** An e-mailed invitation. Only the SHA-256 of the token is stored, so a leaked table grants nothing. */
@Entity('invite')
export class Invite {
  @PrimaryColumn('text')
  id: string;

  @Column('text')
  workshopId: string;

  @ManyToOne(() => Workshop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'workshopId' })
  workshop?: Workshop;

  @Column('text')
  email: string;

  @Column('text')
  role: Role;

  @Index({ unique: true })
  @Column('text')
  tokenHash: string;

  @Column('simple-json')
  vesselIds: string[];

  @Column('text')
  invitedById: string;

  @Column({ type: 'datetime' })
  expiresAt: Date;

  @Column({ type: 'datetime', nullable: true })
  acceptedAt: Date | null;

  /** When a manager withdrew the invite; its link then works no more. */
  @Column({ type: 'datetime', nullable: true })
  revokedAt: Date | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
