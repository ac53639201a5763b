import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A message captured by the local mail fake, readable by the shop's owners in the outbox. */
@Entity('mail_message')
export class MailMessage {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Taken from the X-Probepath-Shop header the mailer sets; null for mail not sent by a shop. */
  @Index()
  @Column('text', { nullable: true })
  shopId: string | null;

  @Column('text')
  fromAddress: string;

  @Column('text')
  toAddress: string;

  @Column('text')
  subject: string;

  @Column('text')
  text: string;

  @Column('text', { nullable: true })
  html: string | null;

  /** JSON list of { filename, contentType, size }; attachment bodies are not kept. */
  @Column('simple-json')
  attachments: { filename: string; contentType: string; size: number }[];

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
