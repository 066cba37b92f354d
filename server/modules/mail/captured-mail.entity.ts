import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A message caught by the development/test SMTP server (never used in production). */
@Entity({ name: 'captured_mail' })
export class CapturedMail {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'text' }) fromAddress!: string;
  @Column({ type: 'text' }) toAddress!: string;
  @Column({ type: 'text' }) subject!: string;
  @Column({ type: 'text', default: '' }) text!: string;
  @Column({ type: 'text', default: '' }) html!: string;
  /** Raw header values by lower-case name (e.g. list-unsubscribe). */
  @Column({ type: 'jsonb', default: {} }) headers!: Record<string, string>;
  /** Attachments as text (the test mail server only ever sees small text ones, such as .ics files). */
  @Column({ type: 'jsonb', default: [] }) attachments!: {
    filename: string;
    contentType: string;
    content: string;
  }[];
  @CreateDateColumn({ type: 'timestamptz' }) receivedAt!: Date;
}
