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
import type { ParameterKey } from '@shared/care/parameters';
import type { DerivedInfo } from '@shared/readings/normalize-water-test';
import type { WaterTestEntries } from '@shared/schemas/water-test.schema';
import { Tank } from './tank.entity';

@Entity({ name: 'water_test' })
@Index('idx_water_test_tank_taken', ['tankId', 'takenAt', 'id'])
export class WaterTest {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) tankId!: string;
  @ManyToOne(() => Tank, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tank_id' })
  tank?: Tank;
  @Column({ type: 'timestamptz' }) takenAt!: Date;
  @Column({ type: 'double precision', nullable: true }) temperatureC!: number | null;
  /** Practical salinity. */
  @Column({ type: 'double precision', nullable: true }) salinityPsu!: number | null;
  @Column({ type: 'double precision', nullable: true, name: 'ph' }) pH!: number | null;
  /** Total ammonia, mg/L as NH3. */
  @Column({ type: 'double precision', nullable: true }) ammoniaMgL!: number | null;
  @Column({ type: 'double precision', nullable: true }) nitriteMgL!: number | null;
  @Column({ type: 'double precision', nullable: true }) nitrateMgL!: number | null;
  @Column({ type: 'double precision', nullable: true }) alkalinityDkh!: number | null;
  @Column({ type: 'double precision', nullable: true }) calciumMgL!: number | null;
  @Column({ type: 'double precision', nullable: true }) magnesiumMgL!: number | null;
  @Column({ type: 'double precision', nullable: true }) phosphateMgL!: number | null;
  /** Derived: un-ionized NH3, mg/L as NH3. */
  @Column({ type: 'double precision', nullable: true }) freeAmmoniaMgL!: number | null;
  @Column({ type: 'jsonb' }) entries!: WaterTestEntries;
  @Column({ type: 'jsonb', default: {} }) derived!: DerivedInfo;
  @Column({ type: 'text', default: '' }) note!: string;
  @Column({ type: 'text', default: 'form' }) origin!: 'form' | 'import';
  @Column({ type: 'uuid', nullable: true }) createdById!: string | null;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}

type ValueProperty =
  | 'temperatureC'
  | 'salinityPsu'
  | 'pH'
  | 'ammoniaMgL'
  | 'nitriteMgL'
  | 'nitrateMgL'
  | 'alkalinityDkh'
  | 'calciumMgL'
  | 'magnesiumMgL'
  | 'phosphateMgL';

/** Where each canonical parameter lives: entity property and SQL column. */
export const VALUE_COLUMNS: Readonly<Record<ParameterKey, { property: ValueProperty; column: string }>> = {
  temperature: { property: 'temperatureC', column: 'temperature_c' },
  salinity: { property: 'salinityPsu', column: 'salinity_psu' },
  pH: { property: 'pH', column: 'ph' },
  ammonia: { property: 'ammoniaMgL', column: 'ammonia_mg_l' },
  nitrite: { property: 'nitriteMgL', column: 'nitrite_mg_l' },
  nitrate: { property: 'nitrateMgL', column: 'nitrate_mg_l' },
  alkalinity: { property: 'alkalinityDkh', column: 'alkalinity_dkh' },
  calcium: { property: 'calciumMgL', column: 'calcium_mg_l' },
  magnesium: { property: 'magnesiumMgL', column: 'magnesium_mg_l' },
  phosphate: { property: 'phosphateMgL', column: 'phosphate_mg_l' },
};
