import http from 'node:http';
import type { AddressInfo } from 'node:net';

export type RawResponse = { status: number; headers: http.IncomingHttpHeaders; body: Buffer };

/** A GET whose body is kept as the bytes sent, whatever its Content-Encoding (supertest would decode it). */
export function rawGet(server: http.Server, urlPath: string, headers: Record<string, string>): Promise<RawResponse> {
  const { port } = server.address() as AddressInfo;
  return new Promise((resolve, reject) => {
    http
      .get({ host: '127.0.0.1', port, path: urlPath, headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () =>
          resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }),
        );
      })
      .on('error', reject);
  });
}

/** Listens on a free loopback port. */
export async function listen(handler: http.RequestListener): Promise<http.Server> {
  const server = http.createServer(handler);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return server;
}
