import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

/** A message the studio sent, as received by the local SMTP server (the outbox) or relayed. */
@Entity('mail_messages')
export class MailMessageEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'varchar', length: 200 })
  to: string;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'simple-json' })
  attachments: { filename: string; size: number }[];

  @Column({ type: 'varchar', length: 200, default: '' })
  messageId: string;

  @Column({ type: 'varchar', length: 12, default: 'sent' })
  status: 'sent' | 'failed';

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
