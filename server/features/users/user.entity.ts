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

@Entity('user')
export class User {
  @PrimaryColumn('text')
  id: string;

  @Column('text')
  workshopId: string;

  @ManyToOne(() => Workshop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'workshopId' })
  workshop?: Workshop;

  /** Stored lower-case; one account per e-mail address across all workshops. */
  @Index({ unique: true })
  @Column('text')
  email: string;

  @Column('text')
  name: string;

  @Column('text')
  role: Role;

  @Column('text')
  passwordHash: string;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  /** Null until the person first changes or resets the password they chose at the invite. */
  @Column({ type: 'datetime', nullable: true })
  passwordChangedAt: Date | null;

  @Column({ type: 'datetime', nullable: true })
  archivedAt: Date | null;
}
