import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'mentor_assignment' })
@Index('idx_mentor_assignment_mentor', ['mentorId', 'clubId'])
@Index('idx_mentor_assignment_mentee', ['menteeId', 'clubId'])
export class MentorAssignment {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) clubId!: string;
  @Column({ type: 'uuid' }) mentorId!: string;
  @Column({ type: 'uuid' }) menteeId!: string;
  @Column({ type: 'timestamptz' }) startedAt!: Date;
  @Column({ type: 'timestamptz', nullable: true }) endedAt!: Date | null;
  @Column({ type: 'uuid', nullable: true }) createdById!: string | null;
}
