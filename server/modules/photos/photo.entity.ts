import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import type { PHOTO_ACCEPTED_TYPES } from '@shared/constants/photos';

/**
 * A photo hangs off a tank, and maybe one of its water tests or events. The relations name their entities by string:
 * photos are stored for the tanks module, which imports this one and not the other way round.
 */
@Entity({ name: 'photo' })
@Index('uq_photo_storage_key', ['storageKey'], { unique: true })
@Index('idx_photo_tank', ['tankId', 'createdAt'])
export class Photo {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) tankId!: string;
  @ManyToOne('Tank', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tank_id' })
  tank?: unknown;
  @Column({ type: 'uuid', nullable: true }) waterTestId!: string | null;
  @ManyToOne('WaterTest', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'water_test_id' })
  waterTest?: unknown;
  @Column({ type: 'uuid', nullable: true }) eventId!: string | null;
  @ManyToOne('TankEvent', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'event_id' })
  event?: unknown;
  /** Random hex chosen by the server; the files are <key>.webp and <key>.thumb.webp in the uploads folder. */
  @Column({ type: 'text' }) storageKey!: string;
  @Column({ type: 'text', default: '' }) caption!: string;
  @Column({ type: 'integer' }) width!: number;
  @Column({ type: 'integer' }) height!: number;
  @Column({ type: 'integer' }) bytes!: number;
  @Column({ type: 'text' }) originalType!: (typeof PHOTO_ACCEPTED_TYPES)[number];
  @Column({ type: 'uuid', nullable: true }) uploadedById!: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
}
