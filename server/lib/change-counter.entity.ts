import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * One row holding the last change number handed out. Runs and run events carry the number of
 * their last change, so a device pulls "everything after N" without trusting any clock.
 */
@Entity('change_counter')
export class ChangeCounter {
  @PrimaryColumn('text')
  name: string;

  @Column({ type: 'integer' })
  value: number;
}
