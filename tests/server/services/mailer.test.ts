/**
 * The mailer through a real SMTP conversation: nodemailer to a local smtp-server on loopback
 * (both from npm), as a deployment with SMTP_URL set would send.
 */
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { createMailer } from '@/server/services/mailer';

describe('createMailer', () => {
  it('createMailer with an SMTP_URL delivers the message to the server', async () => {
    const received: string[] = [];
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      onData(stream, _session, callback) {
        let data = '';
        stream.on('data', (chunk: Buffer) => (data += chunk.toString('utf8')));
        stream.on('end', () => {
          received.push(data);
          callback();
        });
      },
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.server.address() as AddressInfo;
    try {
      const mailer = createMailer(`smtp://127.0.0.1:${port}/?ignoreTLS=true`, 'Ovalyard <no-reply@ovalyard.invalid>');
      await mailer.send({ to: 'player@test.example', subject: 'Set a new Ovalyard password', text: 'Open this link: https://ovalyard.test/reset?token=abc' });
      expect(received).toHaveLength(1);
      expect(received[0]).toMatch(/Subject: Set a new Ovalyard password/);
      expect(received[0]).toMatch(/To: player@test\.example/);
    } finally {
      await new Promise<void>((resolve) => server.close(() => resolve()));
    }
  });

  it('createMailer without an SMTP_URL writes the message to the log instead', async () => {
    const lines: string[] = [];
    await createMailer(null, 'x', (l) => lines.push(l)).send({ to: 'a@test.example', subject: 'Hello', text: 'Body' });
    expect(lines[0]).toMatch(/not sent.*a@test\.example.*Hello/s);
  });
});
