import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import type { Role } from '@shared/constants/roles';
import { Club } from '../clubs';

@Entity({ name: 'invite' })
@Index('idx_invite_club', ['clubId'])
export class Invite {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) clubId!: string;
  @ManyToOne(() => Club, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'club_id' })
  club?: Club;
  @Column({ type: 'text' }) email!: string;
  @Column({ type: 'text' }) role!: Role;
  /** SHA-256 of the token; the token itself exists only in the e-mail. */
  @Index('uq_invite_token_hash', { unique: true })
  @Column({ type: 'text' })
  tokenHash!: string;
  @Column({ type: 'uuid', nullable: true }) invitedById!: string | null;
  @Column({ type: 'timestamptz' }) expiresAt!: Date;
  @Column({ type: 'timestamptz', nullable: true }) acceptedAt!: Date | null;
  @Column({ type: 'timestamptz', nullable: true }) revokedAt!: Date | null;
  @Column({ type: 'timestamptz' }) lastSentAt!: Date;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
}
