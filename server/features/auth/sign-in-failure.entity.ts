import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * Failed sign-ins counted per account (`account:<e-mail>`) and per address (`address:<ip>`) in
 * the database, so a restart does not forget them and a guess counts wherever it lands.
 */
@Entity('sign_in_failure')
export class SignInFailure {
  @PrimaryColumn('text')
  key: string;

  @Column({ type: 'integer' })
  failures: number;

  /** When the current count began (ms since the epoch); a count older than the window starts again. */
  @Column({ type: 'integer' })
  windowStartedAt: number;
}
