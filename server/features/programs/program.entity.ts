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
import type { Program as ProgramDefinition } from '../../../shared/programs/program.schema.js';
import { Workshop } from '../workshops/workshop.entity.js';

/** A break-in template of one workshop. Built-in ones are read-only; a manager copies them to edit. */
@Entity('program')
export class Program {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  workshopId: string;

  @ManyToOne(() => Workshop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'workshopId' })
  workshop?: Workshop;

  /** Set on the workshop's copy of a built-in program (kept up to date from the code). */
  @Column({ type: 'text', nullable: true })
  builtInKey: string | null;

  @Column({ type: 'text', nullable: true })
  copiedFromId: string | null;

  @Column('text')
  name: string;

  /** The whole program (phases, rules, first service) as checked by ProgramSchema. */
  @Column('simple-json')
  definition: ProgramDefinition;

  @Column({ type: 'datetime', nullable: true })
  retiredAt: Date | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;
}
