import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/** Every run change a device sent, by its device-made id: makes patches idempotent and leaves a trail. */
@Entity('run_patch')
export class RunPatchRow {
  @PrimaryColumn('text')
  id: string;

  @Index()
  @Column('text')
  runId: string;

  @Column('text')
  authorId: string;

  /** Device time of the change, epoch ms. */
  @Column({ type: 'integer' })
  at: number;

  @Column({ type: 'integer' })
  receivedAt: number;

  @Column('simple-json')
  body: Record<string, unknown>;
}
