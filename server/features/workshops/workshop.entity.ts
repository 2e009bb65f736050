import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

@Entity('workshop')
export class Workshop {
  @PrimaryColumn('text')
  id: string;

  @Column('text')
  name: string;

  @Column('text', { default: '' })
  address: string;

  @Column('text', { default: '' })
  email: string;

  /** IANA zone name; dates on certificates and reminders are shown in it. */
  @Column('text', { default: 'UTC' })
  timezone: string;

  /** Unit preferences as JSON: { speed, volume, power, temperature }. */
  @Column('simple-json')
  units: {
    speed: 'kn' | 'km/h' | 'mph';
    volume: 'L' | 'US gal';
    power: 'kW' | 'hp';
    temperature: 'C' | 'F';
  };

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
