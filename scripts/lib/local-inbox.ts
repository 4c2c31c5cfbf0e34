/**
 * The local inbox of `npm start`: maildev (a fake SMTP server with a web inbox, from npm) on
 * loopback, so a newcomer sees every message Ovalyard sends. Not started when SMTP_URL points
 * elsewhere (production).
 */
import { spawn, type ChildProcess } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';

export interface LocalInbox {
  smtpUrl: string;
  webUrl: string;
  stop: () => void;
}

/** Resolves when something listens on the port (or rejects after the timeout). */
function waitForPort(port: number, timeoutMs: number): Promise<void> {
  const started = Date.now();
  return new Promise((resolve, reject) => {
    const attempt = () => {
      const socket = net.connect(port, '127.0.0.1');
      socket.once('connect', () => {
        socket.end();
        resolve();
      });
      socket.once('error', () => {
        socket.destroy();
        if (Date.now() - started > timeoutMs) reject(new Error(`the local inbox did not open port ${port}`));
        else setTimeout(attempt, 150);
      });
    };
    attempt();
  });
}

/** Whether nothing listens on the loopback port yet. */
function portFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', () => resolve(false));
    server.listen(port, '127.0.0.1', () => server.close(() => resolve(true)));
  });
}

/** Starts maildev on MAILDEV_SMTP_PORT / MAILDEV_WEB_PORT (1025 / 1080 by default), loopback only. */
export async function startLocalInbox(root: string, env: NodeJS.ProcessEnv = process.env): Promise<LocalInbox> {
  const smtp = Number(env.MAILDEV_SMTP_PORT ?? 1025);
  const web = Number(env.MAILDEV_WEB_PORT ?? 1080);
  for (const [name, port] of [['MAILDEV_SMTP_PORT', smtp], ['MAILDEV_WEB_PORT', web]] as const) {
    if (!(await portFree(port))) throw new Error(`port ${port} is taken; set ${name} to a free one`);
  }
  const bin = path.join(root, 'node_modules/maildev/dist/bin/maildev.js');
  const child: ChildProcess = spawn(process.execPath, [bin, '--smtp', String(smtp), '--web', String(web), '--ip', '127.0.0.1', '--web-ip', '127.0.0.1'], {
    cwd: root,
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  try {
    await waitForPort(smtp, 15_000);
  } catch (err) {
    child.kill('SIGTERM');
    throw err;
  }
  return {
    smtpUrl: `smtp://127.0.0.1:${smtp}/?ignoreTLS=true`,
    webUrl: `http://127.0.0.1:${web}`,
    stop: () => {
      if (child.exitCode === null) child.kill('SIGTERM');
    },
  };
}
