import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

/** A "forgot my password" link. Only the SHA-256 of its token is stored; it works once, briefly. */
@Entity('password_reset')
export class PasswordReset {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  userId: string;

  @Index({ unique: true })
  @Column('text')
  tokenHash: string;

  @Column({ type: 'datetime' })
  expiresAt: Date;

  /** When the link was used, or made useless by a newer password; null while it still works. */
  @Column({ type: 'datetime', nullable: true })
  usedAt: Date | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
