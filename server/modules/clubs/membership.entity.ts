import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import type { MembershipStatus, Role } from '@shared/constants/roles';
import { User } from '../users';
import { Club } from './club.entity';

@Entity({ name: 'membership' })
@Index('uq_membership_club_user', ['clubId', 'userId'], { unique: true })
@Index('idx_membership_user', ['userId'])
export class Membership {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) clubId!: string;
  @ManyToOne(() => Club, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'club_id' })
  club?: Club;
  @Column({ type: 'uuid' }) userId!: string;
  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: User;
  @Column({ type: 'text' }) role!: Role;
  @Column({ type: 'text', default: 'active' }) status!: MembershipStatus;
  /** How many mentees a mentor takes on; null means the club's default. */
  @Column({ type: 'integer', nullable: true }) mentorCapacity!: number | null;
  @CreateDateColumn({ type: 'timestamptz' }) joinedAt!: Date;
}
