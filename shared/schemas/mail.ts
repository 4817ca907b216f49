import { z } from 'zod';

/** A message in the studio's outbox, as the mail server received it. */
export interface MailMessageDto {
  id: number;
  to: string;
  subject: string;
  text: string;
  attachments: { filename: string; size: number }[];
  messageId: string;
  status: 'sent' | 'failed';
  createdAt: string;
}

export const inviteParams = z.object({ userId: z.coerce.number().int().positive() });
export const inviteInput = z.object({ note: z.string().trim().max(1000, 'At most 1000 characters').default('') });
