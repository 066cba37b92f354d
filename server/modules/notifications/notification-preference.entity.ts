import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { EmailMode, NotificationKind } from '@shared/constants/notifications';

/** One row per kind the person changed; a missing row means the default in DEFAULT_EMAIL_MODES. */
@Entity({ name: 'notification_preference' })
export class NotificationPreference {
  @PrimaryColumn({ type: 'uuid' }) userId!: string;
  @PrimaryColumn({ type: 'text' }) kind!: NotificationKind;
  @Column({ type: 'text' }) emailMode!: EmailMode;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}
