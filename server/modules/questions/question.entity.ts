import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import type { QuestionSnapshot } from '@shared/schemas/question-views';
import type { QuestionStatus } from '@shared/schemas/question.schema';
import { Club } from '../clubs';
import { TankEvent, Tank, WaterTest } from '../tanks';
import { User } from '../users';

/** A keeper's question about one water test or observation; `askerId` is always the tank's owner. */
@Entity({ name: 'question' })
@Index('idx_question_club_tank_open', ['clubId', 'tankId'], { where: "status = 'open'" })
@Index('idx_question_club_created', ['clubId', 'createdAt', 'id'])
@Index('idx_question_asker', ['askerId'])
@Index('idx_question_tank', ['tankId'])
export class Question {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) clubId!: string;
  @ManyToOne(() => Club, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'club_id' })
  club?: Club;
  @Column({ type: 'uuid' }) tankId!: string;
  @ManyToOne(() => Tank, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tank_id' })
  tank?: Tank;
  @Column({ type: 'uuid' }) askerId!: string;
  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'asker_id' })
  asker?: User;
  @Column({ type: 'uuid', nullable: true }) waterTestId!: string | null;
  @ManyToOne(() => WaterTest, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'water_test_id' })
  waterTest?: WaterTest;
  @Column({ type: 'uuid', nullable: true }) eventId!: string | null;
  @ManyToOne(() => TankEvent, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'event_id' })
  event?: TankEvent;
  @Column({ type: 'text' }) title!: string;
  @Column({ type: 'text' }) body!: string;
  @Column({ type: 'text', default: 'open' }) status!: QuestionStatus;
  @Column({ type: 'jsonb' }) snapshot!: QuestionSnapshot;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @Column({ type: 'timestamptz', nullable: true }) answeredAt!: Date | null;
}

@Entity({ name: 'question_reply' })
@Index('idx_question_reply_question_created', ['questionId', 'createdAt', 'id'])
@Index('idx_question_reply_author', ['authorId'])
export class QuestionReply {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) questionId!: string;
  @ManyToOne(() => Question, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'question_id' })
  question?: Question;
  @Column({ type: 'uuid' }) authorId!: string;
  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'author_id' })
  author?: User;
  @Column({ type: 'text' }) body!: string;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
}
