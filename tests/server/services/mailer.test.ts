/**
 * The mailer through a real SMTP conversation: nodemailer to a local smtp-server on loopback
 * (both from npm), as a deployment with SMTP_URL set would send.
 */
import { createMailer } from '@/server/services/mailer';
import { useSmtpCapture } from '../../support/smtp-capture';

const smtp = useSmtpCapture();

describe('createMailer', () => {
  it('createMailer with an SMTP_URL delivers the message to the server', async () => {
    const mailer = createMailer(smtp.url(), 'Ovalyard <no-reply@ovalyard.invalid>');
    await mailer.send({ to: 'player@test.example', subject: 'Set a new Ovalyard password', text: 'Open this link: https://ovalyard.test/reset?token=abc' });
    expect(smtp.received).toHaveLength(1);
    expect(smtp.received[0]).toMatch(/Subject: Set a new Ovalyard password/);
    expect(smtp.received[0]).toMatch(/To: player@test\.example/);
  });

  it('createMailer without an SMTP_URL writes the message to the log instead', async () => {
    const lines: string[] = [];
    await createMailer(null, 'x', (l) => lines.push(l)).send({ to: 'a@test.example', subject: 'Hello', text: 'Body' });
    expect(lines[0]).toMatch(/not sent.*a@test\.example.*Hello/s);
  });
});
