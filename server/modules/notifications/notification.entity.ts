import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { NotificationKind } from '@shared/constants/notifications';

@Entity({ name: 'notification' })
@Index('idx_notification_user_created', ['userId', 'createdAt', 'id'])
export class Notification {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) userId!: string;
  @Column({ type: 'uuid' }) clubId!: string;
  @Column({ type: 'text' }) kind!: NotificationKind;
  @Column({ type: 'text' }) title!: string;
  @Column({ type: 'text', default: '' }) body!: string;
  /** A path inside the app, e.g. /tanks/…; e-mails prefix the public base URL. */
  @Column({ type: 'text' }) link!: string;
  @Column({ type: 'text', nullable: true }) subjectType!: string | null;
  @Column({ type: 'text', nullable: true }) subjectId!: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @Column({ type: 'timestamptz', nullable: true }) readAt!: Date | null;
  @Column({ type: 'timestamptz', nullable: true }) emailedAt!: Date | null;
  @Column({ type: 'uuid', nullable: true }) digestId!: string | null;
}
