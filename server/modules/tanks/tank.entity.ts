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
import type { SystemType } from '@shared/care/system-types';
import type { TankPhase } from '@shared/care/types';
import type { TankShape } from '@shared/chemistry/tank-volume';
import { Club } from '../clubs';
import { User } from '../users';

@Entity({ name: 'tank' })
@Index('idx_tank_club_owner', ['clubId', 'ownerId'])
@Index('idx_tank_owner', ['ownerId'])
export class Tank {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) clubId!: string;
  @ManyToOne(() => Club, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'club_id' })
  club?: Club;
  @Column({ type: 'uuid' }) ownerId!: string;
  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'owner_id' })
  owner?: User;
  @Column({ type: 'text' }) name!: string;
  @Column({ type: 'text' }) systemType!: SystemType;
  /** Water held, litres: as entered, or net of displacement when worked out from the dimensions. */
  @Column({ type: 'double precision' }) volumeL!: number;
  @Column({ type: 'text' }) volumeSource!: 'entered' | 'dimensions';
  @Column({ type: 'text', nullable: true }) shape!: TankShape | null;
  @Column({ type: 'double precision', nullable: true }) lengthCm!: number | null;
  @Column({ type: 'double precision', nullable: true }) widthCm!: number | null;
  @Column({ type: 'double precision', nullable: true }) heightCm!: number | null;
  @Column({ type: 'double precision', nullable: true }) diameterCm!: number | null;
  @Column({ type: 'double precision', nullable: true }) bowDepthCm!: number | null;
  @Column({ type: 'double precision', nullable: true }) fillHeightCm!: number | null;
  @Column({ type: 'double precision', nullable: true }) displacementFraction!: number | null;
  @Column({ type: 'date', nullable: true }) setUpOn!: string | null;
  @Column({ type: 'text', default: 'cycling' }) phase!: TankPhase;
  @Column({ type: 'text', default: '' }) equipmentNotes!: string;
  @Column({ type: 'text' }) careProfileKey!: string;
  @Column({ type: 'timestamptz', nullable: true }) archivedAt!: Date | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}
