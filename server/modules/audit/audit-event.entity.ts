import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'audit_event' })
@Index('idx_audit_event_club_at', ['clubId', 'at'])
export class AuditEvent {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid', nullable: true }) actorId!: string | null;
  @Column({ type: 'uuid', nullable: true }) clubId!: string | null;
  @Column({ type: 'text' }) action!: string;
  @Column({ type: 'text', nullable: true }) targetType!: string | null;
  @Column({ type: 'text', nullable: true }) targetId!: string | null;
  @Column({ type: 'jsonb', default: {} }) details!: Record<string, unknown>;
  @CreateDateColumn({ type: 'timestamptz' }) at!: Date;
}
