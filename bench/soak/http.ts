import { Agent, request } from 'node:http';

/** Keep-alive connections, as a browser keeps them, so each request does not pay a handshake. */
const agent = new Agent({ keepAlive: true, maxSockets: 256 });

export interface Answer {
  status: number;
  body: Buffer;
  ms: number;
}

/** One HTTP request; resolves with the status, body and time taken, rejects on network errors. */
export function httpRequest(
  base: string,
  options: { method: string; path: string; headers?: Record<string, string>; body?: string },
): Promise<Answer> {
  const started = performance.now();
  return new Promise((resolve, reject) => {
    const req = request(
      `${base}${options.path}`,
      { method: options.method, headers: options.headers, agent },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () =>
          resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks), ms: performance.now() - started }),
        );
        res.on('error', reject);
      },
    );
    req.on('error', reject);
    if (options.body !== undefined) req.end(options.body);
    else req.end();
  });
}

export function dropConnections(): void {
  agent.destroy();
}
