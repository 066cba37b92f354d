import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity({ name: 'club' })
export class Club {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'text' }) name!: string;
  @Index('uq_club_slug', { unique: true })
  @Column({ type: 'text' })
  slug!: string;
  @Column({ type: 'text', default: '' }) description!: string;
  @Column({ type: 'text', default: '' }) locationText!: string;
  @Column({ type: 'text', default: 'UTC' }) timeZone!: string;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
}
