import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { CareProfile } from '@shared/care';

/** A club's own copy of a care profile. Its definition lives in versions; `currentVersion` points at the newest. */
@Entity({ name: 'club_care_profile' })
@Index('uq_club_care_profile_key', ['clubId', 'key'], { unique: true })
export class ClubCareProfile {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) clubId!: string;
  @Column({ type: 'text' }) key!: string;
  @Column({ type: 'text' }) basedOnKey!: string;
  @Column({ type: 'integer' }) currentVersion!: number;
  @Column({ type: 'uuid', nullable: true }) createdById!: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
}

@Entity({ name: 'club_care_profile_version' })
@Index('uq_club_care_profile_version', ['profileId', 'version'], { unique: true })
export class ClubCareProfileVersion {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) profileId!: string;
  @Column({ type: 'integer' }) version!: number;
  @Column({ type: 'jsonb' }) definition!: CareProfile;
  /** Which fields changed from the previous version, in words, e.g. "ranges.nitrate.ideal: 0–5 → 0–10". */
  @Column({ type: 'jsonb', default: [] }) changes!: string[];
  @Column({ type: 'text' }) note!: string;
  @Column({ type: 'uuid', nullable: true }) changedById!: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) changedAt!: Date;
}
