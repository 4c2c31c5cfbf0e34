import type { Express } from 'express';
import http from 'node:http';
import type { AddressInfo } from 'node:net';

/** A GET on the app over a real socket, the body as sent (supertest would decode gzip and brotli itself). */
export async function rawGet(app: Express, url: string, headers: Record<string, string>): Promise<{ status: number; headers: http.IncomingHttpHeaders; body: Buffer }> {
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const { port } = server.address() as AddressInfo;
  try {
    return await new Promise((resolve, reject) => {
      http
        .get({ host: '127.0.0.1', port, path: url, headers }, (res) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
        })
        .on('error', reject);
    });
  } finally {
    server.close();
  }
}
