import { Column, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { AnyParameterKey, Severity } from '@shared/care';

export type ConcernStatus = 'open' | 'acknowledged' | 'resolved';

/** Something the evaluation flagged on a tank; kept after it is resolved so the history shows it. */
@Entity({ name: 'concern' })
export class ConcernRow {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) clubId!: string;
  @Column({ type: 'uuid' }) tankId!: string;
  @Column({ type: 'uuid' }) ownerId!: string;
  @Column({ type: 'uuid', nullable: true }) waterTestId!: string | null;
  @Column({ type: 'text' }) rule!: string;
  /** A parameter key, or 'stocking' for the stocked-without-sign-off flag. */
  @Column({ type: 'text' }) parameter!: AnyParameterKey | 'stocking';
  @Column({ type: 'text' }) severity!: Severity;
  @Column({ type: 'text' }) reason!: string;
  @Column({ type: 'jsonb', default: [] }) nextSteps!: string[];
  @Column({ type: 'jsonb', nullable: true }) waterChanges!:
    { litres: number; fraction: number; resulting: number }[] | null;
  @Column({ type: 'double precision', nullable: true }) value!: number | null;
  @Column({ type: 'text', nullable: true }) unit!: string | null;
  @Column({ type: 'text', default: 'open' }) status!: ConcernStatus;
  @Column({ type: 'timestamptz' }) raisedAt!: Date;
  @Column({ type: 'timestamptz' }) lastSeenAt!: Date;
  @Column({ type: 'uuid', nullable: true }) acknowledgedById!: string | null;
  @Column({ type: 'timestamptz', nullable: true }) acknowledgedAt!: Date | null;
  @Column({ type: 'text', nullable: true }) acknowledgeNote!: string | null;
  @Column({ type: 'uuid', nullable: true }) resolvedById!: string | null;
  @Column({ type: 'timestamptz', nullable: true }) resolvedAt!: Date | null;
  @Column({ type: 'text', nullable: true }) resolveNote!: string | null;
  /** True when a later test cleared it rather than a person. */
  @Column({ type: 'boolean', default: false }) resolvedByTest!: boolean;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}

@Entity({ name: 'tank_readiness' })
export class TankReadiness {
  @Column({ type: 'uuid', primary: true }) tankId!: string;
  @Column({ type: 'boolean', default: false }) equipmentRunning!: boolean;
  @Column({ type: 'boolean', default: false }) quarantinePlan!: boolean;
  @Column({ type: 'boolean', default: false }) foodReady!: boolean;
  @Column({ type: 'text', default: '' }) notes!: string;
  @Column({ type: 'uuid', nullable: true }) signedOffById!: string | null;
  @Column({ type: 'timestamptz', nullable: true }) signedOffAt!: Date | null;
  @Column({ type: 'text', nullable: true }) signOffNote!: string | null;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}
