/**
 * Listening on a port with @hono/node-server: loopback by default; the Host values the
 * app should answer once the port is known; a clean close.
 */
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { serve } from '@hono/node-server';
import type { Hono } from 'hono';
import { inputError } from '../errors.ts';
import { DEFAULT_HOST, DEFAULT_PORT } from './address.ts';

export interface RunningServer {
  host: string;
  port: number;
  /** Base URL, e.g. http://127.0.0.1:4173 */
  url: string;
  close(): Promise<void>;
}

export function startServer(app: Hono, options: { host?: string; port?: number } = {}): Promise<RunningServer> {
  const host = options.host ?? DEFAULT_HOST;
  const port = options.port ?? DEFAULT_PORT;
  return new Promise((resolve, reject) => {
    const onError = (e: NodeJS.ErrnoException) => {
      reject(inputError('cannot-listen', '--port', `cannot listen on ${host}:${port}: ${e.code ?? e.message}`, port));
    };
    const server = serve({ fetch: app.fetch, port, hostname: host }, (info: AddressInfo) => {
      server.off('error', onError);
      server.requestTimeout = 60_000;
      server.headersTimeout = 20_000;
      const shown = info.family === 'IPv6' ? `[${info.address}]` : info.address;
      resolve({
        host,
        port: info.port,
        url: `http://${shown}:${info.port}`,
        close: () =>
          new Promise<void>((done) => {
            server.close(() => done());
            server.closeIdleConnections();
          }),
      });
    }) as Server;
    server.once('error', onError);
  });
}
