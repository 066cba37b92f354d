import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { MeetupKind, MeetupStatus, RsvpStatus } from '../../../shared/constants/meetups';
import { Club } from '../clubs';
import { User } from '../users';

@Entity({ name: 'meetup' })
@Index('idx_meetup_club_starts', ['clubId', 'startsAt'])
export class Meetup {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) clubId!: string;
  @ManyToOne(() => Club, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'club_id' })
  club?: Club;
  @Column({ type: 'text' }) kind!: MeetupKind;
  @Column({ type: 'text' }) title!: string;
  @Column({ type: 'text', default: '' }) description!: string;
  @Column({ type: 'timestamptz' }) startsAt!: Date;
  @Column({ type: 'timestamptz' }) endsAt!: Date;
  @Column({ type: 'text', default: '' }) placeText!: string;
  @Column({ type: 'text', nullable: true }) mapUrl!: string | null;
  @Column({ type: 'text', nullable: true }) onlineUrl!: string | null;
  @Column({ type: 'integer' }) capacity!: number;
  @Column({ type: 'uuid', nullable: true }) hostId!: string | null;
  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'host_id' })
  host?: User;
  /** Clinics only. */
  @Column({ type: 'integer', nullable: true }) slotMinutes!: number | null;
  @Column({ type: 'text', default: 'scheduled' }) status!: MeetupStatus;
  @Column({ type: 'text', nullable: true }) cancelReason!: string | null;
  @Column({ type: 'timestamptz', nullable: true }) cancelledAt!: Date | null;
  /** iCalendar SEQUENCE: goes up with every change, so calendars replace their copy. */
  @Column({ type: 'integer', default: 0 }) sequence!: number;
  @Column({ type: 'uuid', nullable: true }) createdById!: string | null;
  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'created_by_id' })
  createdBy?: User;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}

@Entity({ name: 'meetup_rsvp' })
@Index('uq_meetup_rsvp_meetup_user', ['meetupId', 'userId'], { unique: true })
@Index('idx_meetup_rsvp_user', ['userId'])
export class MeetupRsvp {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) meetupId!: string;
  @ManyToOne(() => Meetup, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'meetup_id' })
  meetup?: Meetup;
  @Column({ type: 'uuid' }) userId!: string;
  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: User;
  @Column({ type: 'text' }) status!: RsvpStatus;
  /** Place in the order answers were handed a place or a spot in line (from a sequence; bigint comes back as text). */
  @Column({ type: 'bigint' }) arrival!: string;
  @Column({ type: 'timestamptz' }) respondedAt!: Date;
  @Column({ type: 'timestamptz', nullable: true }) promotedAt!: Date | null;
  @Column({ type: 'timestamptz', nullable: true }) slotStartsAt!: Date | null;
  @Column({ type: 'uuid', nullable: true }) tankId!: string | null;
  @Column({ type: 'uuid', nullable: true }) waterTestId!: string | null;
  @Column({ type: 'timestamptz', nullable: true }) checkedInAt!: Date | null;
  @Column({ type: 'uuid', nullable: true }) checkedInById!: string | null;
}
