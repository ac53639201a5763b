import nodemailer from 'nodemailer';

export interface OutgoingMail {
  /** The shop the mail is sent for; the local fake files it in that shop's outbox. */
  shopId: string;
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

export const SHOP_HEADER = 'X-Probepath-Shop';

/** Sends over SMTP: the local fake by default, a real server when SMTP_URL is set. */
export function createMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send(mail) {
      await transport.sendMail({
        from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        attachments: mail.attachments,
        headers: { [SHOP_HEADER]: mail.shopId },
      });
    },
    close: () => transport.close(),
  };
}
