import nodemailer from 'nodemailer';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
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
        log(`[mail not sent: no SMTP_URL] to ${m.to}: ${m.subject}\n${m.text}`);
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
