import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { ExperienceLevel } from '@shared/constants/roles';
import type { SalinityDisplay, TemperatureUnit, VolumeUnit } from '@shared/constants/units';

@Entity({ name: 'app_user' })
export class User {
  @PrimaryGeneratedColumn('uuid') id!: string;
  /** Stored lower-cased; a unique index on lower(email) guards against mixed-case duplicates. */
  @Column({ type: 'text' }) email!: string;
  @Column({ type: 'text' }) displayName!: string;
  @Column({ type: 'text' }) passwordHash!: string;
  @Column({ type: 'text', default: 'beginner' }) experienceLevel!: ExperienceLevel;
  @Column({ type: 'text', default: 'C' }) temperatureUnit!: TemperatureUnit;
  @Column({ type: 'text', default: 'L' }) volumeUnit!: VolumeUnit;
  @Column({ type: 'text', default: 'sg' }) salinityDisplay!: SalinityDisplay;
  @Column({ type: 'text', default: 'UTC' }) timeZone!: string;
  @Column({ type: 'timestamptz', nullable: true }) disabledAt!: Date | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}
