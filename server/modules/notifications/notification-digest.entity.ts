import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A sent (or claimed) daily digest; the unique (user, date) pair is what makes it once a day. */
@Entity({ name: 'notification_digest' })
@Index('uq_notification_digest_user_date', ['userId', 'digestDate'], { unique: true })
export class NotificationDigest {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) userId!: string;
  /** The user's local calendar date, YYYY-MM-DD. */
  @Column({ type: 'date' }) digestDate!: string;
  @Column({ type: 'integer', default: 0 }) notificationCount!: number;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
}
