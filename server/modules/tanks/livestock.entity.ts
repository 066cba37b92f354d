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
import { Tank } from './tank.entity';

@Entity({ name: 'livestock' })
@Index('idx_livestock_tank', ['tankId', 'addedOn'])
export class Livestock {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) tankId!: string;
  @ManyToOne(() => Tank, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tank_id' })
  tank?: Tank;
  @Column({ type: 'text' }) speciesCommonName!: string;
  @Column({ type: 'integer' }) count!: number;
  @Column({ type: 'date' }) addedOn!: string;
  @Column({ type: 'text', default: '' }) source!: string;
  @Column({ type: 'text', default: '' }) quarantineNotes!: string;
  @Column({ type: 'date', nullable: true }) removedOn!: string | null;
  @Column({ type: 'text', nullable: true }) removalReason!: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}
