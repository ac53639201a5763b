import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Write } from '../db/writer';
import { MailMessage } from './mail-message.entity';
import { SHOP_HEADER } from './mailer';

const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

export interface FakeSmtp {
  url: string;
  close(): Promise<void>;
}

/**
 * A local SMTP server on loopback that stores every message it receives in the
 * outbox table, so the demo and the tests work with no real mailbox.
 */
export async function startFakeSmtp(write: Write): Promise<FakeSmtp> {
  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const shopHeader = parsed.headers.get(SHOP_HEADER.toLowerCase());
          await write((tx) => tx.getRepository(MailMessage).save({
            shopId: typeof shopHeader === 'string' ? shopHeader : null,
            fromAddress: addressText(parsed.from),
            toAddress: addressText(parsed.to),
            subject: parsed.subject ?? '(no subject)',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            attachments: parsed.attachments.map((a) => ({
              filename: a.filename ?? 'attachment',
              contentType: a.contentType,
              size: a.size,
            })),
          }));
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve());
  });
  const { port } = server.server.address() as AddressInfo;
  return {
    url: `smtp://127.0.0.1:${port}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

function addressText(a: AddressObject | AddressObject[] | undefined): string {
  if (!a) return '';
  return (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ');
}
