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
import type { TankEventKind } from '@shared/schemas/tank-event.schema';
import type { TankEventView } from '@shared/schemas/tank-views';
import { Livestock } from './livestock.entity';
import { Tank } from './tank.entity';

@Entity({ name: 'tank_event' })
@Index('idx_tank_event_tank_occurred', ['tankId', 'occurredAt', 'id'])
export class TankEvent {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) tankId!: string;
  @ManyToOne(() => Tank, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tank_id' })
  tank?: Tank;
  @Column({ type: 'text' }) kind!: TankEventKind;
  @Column({ type: 'timestamptz' }) occurredAt!: Date;
  @Column({ type: 'text', default: '' }) note!: string;
  /** Validated against the kind's schema on every write. */
  @Column({ type: 'jsonb', default: {} }) details!: Record<string, unknown>;
  @Column({ type: 'jsonb', default: {} }) computed!: TankEventView['computed'];
  @Column({ type: 'uuid', nullable: true }) livestockId!: string | null;
  @ManyToOne(() => Livestock, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'livestock_id' })
  livestock?: Livestock;
  @Column({ type: 'uuid', nullable: true }) createdById!: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}
