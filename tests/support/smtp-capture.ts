import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

/**
 * A real SMTP server on a free loopback port for one test file: every message's raw text lands in
 * `received`. Registers its own beforeAll/afterAll; `url()` is the SMTP_URL for the app under test.
 */
export function useSmtpCapture(): { received: string[]; url: () => string } {
  const received: string[] = [];
  let smtp: SMTPServer;
  let port = 0;
  beforeAll(async () => {
    smtp = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      size: 10 * 1024 * 1024,
      onData(stream, _session, callback) {
        let data = '';
        stream.on('data', (chunk: Buffer) => (data += chunk.toString('utf8')));
        stream.on('end', () => {
          received.push(data);
          callback();
        });
      },
    });
    await new Promise<void>((resolve) => smtp.listen(0, '127.0.0.1', resolve));
    port = (smtp.server.address() as AddressInfo).port;
  });
  afterAll(async () => {
    await new Promise<void>((resolve) => smtp.close(() => resolve()));
  });
  return { received, url: () => `smtp://127.0.0.1:${port}/?ignoreTLS=true` };
}
