import nodemailer from 'nodemailer';

export interface MailAttachment {
  filename: string;
  content: Buffer;
  contentType: string;
}

export interface MailMessage {
  to: string;
  /** Copies (e.g. the shop). */
  cc?: string[];
  subject: string;
  text: string;
  html?: string;
  attachments?: MailAttachment[];
}

export interface Mailer {
  send(message: MailMessage): Promise<void>;
}

/**
 * SMTP through nodemailer when SMTP_URL is set; otherwise the messages are written to the log
 * (development), so nothing is lost and nothing is sent by accident.
 */
export function createMailer(smtpUrl: string | null, from: string, log: (line: string) => void = console.log): Mailer {
  if (!smtpUrl) {
    return {
      async send(m) {
        const copies = m.cc?.length ? ` (copy to ${m.cc.join(', ')})` : '';
        const files = m.attachments?.length ? `\n[attached: ${m.attachments.map((a) => `${a.filename}, ${a.content.length} bytes`).join('; ')}]` : '';
        log(`[mail not sent: no SMTP_URL] to ${m.to}${copies}: ${m.subject}\n${m.text}${files}`);
      },
    };
  }
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send(m) {
      await transport.sendMail({ from, ...m });
    },
  };
}
