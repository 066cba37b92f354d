import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { MentorRequestState } from '@shared/constants/mentorship';

@Entity({ name: 'mentor_request' })
@Index('uq_mentor_request_open', ['clubId', 'requesterId'], { unique: true, where: "state = 'open'" })
@Index('idx_mentor_request_club_state', ['clubId', 'state', 'createdAt'])
export class MentorRequest {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) clubId!: string;
  @Column({ type: 'uuid' }) requesterId!: string;
  @Column({ type: 'uuid', nullable: true }) preferredMentorId!: string | null;
  @Column({ type: 'text', default: '' }) note!: string;
  @Column({ type: 'text', default: 'open' }) state!: MentorRequestState;
  @Column({ type: 'text', nullable: true }) declineReason!: string | null;
  @Column({ type: 'uuid', nullable: true }) decidedById!: string | null;
  @Column({ type: 'timestamptz', nullable: true }) decidedAt!: Date | null;
  @Column({ type: 'uuid', nullable: true }) assignmentId!: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
}
