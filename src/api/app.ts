/**
 * The HTTP API as a hono app. `createApp` takes the open catalog and
 * returns the app, so tests drive it in-process with `app.request()` and `hesper serve`
 * hands it to @hono/node-server.
 */
import { Hono } from 'hono';
import { bodyLimit } from 'hono/body-limit';
import type { Catalog } from '../catalog/index.ts';
import { CatalogSnapshots } from './catalog-snapshot.ts';
import { errorHandler, errorResponse, type Logger } from './http-errors.ts';
import { inlineInterpreter, type Interpreter } from './interpreter.ts';
import { MAX_BODY_BYTES } from './limits.ts';
import { catalogRoutes } from './routes/catalog.ts';
import { demoRoutes } from './routes/demos.ts';
import { interpretRoutes } from './routes/interpret.ts';
import { metaRoutes } from './routes/meta.ts';
import { pageRoutes } from './routes/page.ts';
import { reportRoutes } from './routes/report.ts';

export interface AppOptions {
  catalog: Catalog;
  /** Who computes interpretations (default: in the request's thread). */
  interpreter?: Interpreter;
  /** Where unexpected failures are logged (default: stderr). */
  log?: Logger;
  /**
   * Host header values the app answers (e.g. "127.0.0.1:4173"); others get 403. Set by
   * `hesper serve` on loopback so a web page cannot reach the API by DNS rebinding.
   */
  allowedHosts?: readonly string[] | (() => readonly string[]);
}

const stderrLog: Logger = (line) => {
  process.stderr.write(`${line}\n`);
};

export function createApp(options: AppOptions): Hono {
  const deps = {
    catalog: options.catalog,
    snapshots: new CatalogSnapshots(options.catalog),
    interpreter: options.interpreter ?? inlineInterpreter(),
    log: options.log ?? stderrLog,
  };
  const app = new Hono();
  app.onError(errorHandler(deps.log));
  app.notFound((c) =>
    errorResponse(c, 404, 'unknown-route', `no route ${c.req.method} ${c.req.path.slice(0, 200)}`, [
      { path: 'path', message: `no route answers ${c.req.method} ${c.req.path.slice(0, 200)}; GET /api/openapi.json lists the routes` },
    ]),
  );

  app.use('*', async (c, next) => {
    const hosts = typeof options.allowedHosts === 'function' ? options.allowedHosts() : options.allowedHosts;
    const host = (c.req.header('host') ?? new URL(c.req.url).host).toLowerCase();
    if (hosts && !hosts.includes(host)) {
      return errorResponse(c, 403, 'bad-host', 'this server answers only requests addressed to its own loopback address', [
        { path: 'Host', message: `Host ${JSON.stringify(host.slice(0, 100))} is not one this server answers`, allowed: hosts.join(', ') },
      ]);
    }
    await next();
    c.header('X-Content-Type-Options', 'nosniff');
    c.header('Referrer-Policy', 'no-referrer');
    if (c.req.path.startsWith('/api/')) c.header('Cache-Control', 'no-store');
  });

  // hono passes only Error instances to onError; a route that throws anything else (a
  // string, a plain object from a worker) would otherwise reject app.fetch itself.
  app.use('*', async (c, next) => {
    try {
      await next();
    } catch (e) {
      if (e instanceof Error) throw e;
      const what = typeof e === 'string' ? e : Object.prototype.toString.call(e);
      return errorHandler(deps.log)(new Error(`a value that is not an Error was thrown: ${what}`), c);
    }
  });

  app.use(
    '/api/*',
    bodyLimit({
      maxSize: MAX_BODY_BYTES,
      onError: (c) =>
        errorResponse(c, 413, 'payload-too-large', `the request body exceeds ${MAX_BODY_BYTES} bytes`, [
          { path: 'body', message: `larger than ${MAX_BODY_BYTES} bytes (1 MiB)`, allowed: `at most ${MAX_BODY_BYTES} bytes` },
        ]),
    }),
  );

  metaRoutes(app, deps);
  interpretRoutes(app, deps);
  reportRoutes(app, deps);
  catalogRoutes(app, deps);
  demoRoutes(app);
  pageRoutes(app);
  return app;
}
