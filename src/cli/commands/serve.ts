/**
 * `hesper serve [--port 4173] [--host 127.0.0.1] [--db PATH] [--workers N]`: the HTTP
 * API and the page. The catalog is opened once at start; interpretations run on worker
 * threads. Binding anything but loopback prints a warning: the API has no login.
 */
import type { Command } from 'commander';
import { DEFAULT_HOST, DEFAULT_PORT, isLoopbackHost, loopbackHostHeaders } from '../../api/address.ts';
import { defaultWorkerCount } from '../../batch/pool.ts';
import { inputError } from '../../errors.ts';
import type { CliIo } from '../io.ts';
import { intOption } from '../options.ts';

interface ServeOptions {
  port: number;
  host: string;
  db?: string;
  workers?: number;
}

function checkHost(host: string): string {
  const h = host.trim();
  if (h === '' || h.length > 253 || /[\s/?#@]/.test(h)) {
    throw inputError('invalid-input', '--host', `--host ${JSON.stringify(host)}: give an address or host name of this machine, e.g. 127.0.0.1`, host);
  }
  return h;
}

/** Resolves when the process is asked to stop (SIGINT or SIGTERM). */
function stopSignal(): Promise<string> {
  return new Promise((resolve) => {
    const on = (sig: NodeJS.Signals) => {
      process.off('SIGINT', on);
      process.off('SIGTERM', on);
      resolve(sig);
    };
    process.on('SIGINT', on);
    process.on('SIGTERM', on);
  });
}

export function registerServe(program: Command, io: CliIo): void {
  program
    .command('serve')
    .description('serve the HTTP API (/api/...) and the page (/) on this machine')
    .option('--port <n>', 'TCP port (0 picks a free one)', intOption('port', 0, 65535), DEFAULT_PORT)
    .option('--host <address>', 'address to listen on; anything but loopback is reachable from other machines', checkHost, DEFAULT_HOST)
    .option('--db <path>', 'catalog database file (default: $HESPER_DB, else db/hesper.sqlite in the hesper folder)')
    .option('--workers <n>', `interpretation worker threads (default: the cores, here ${defaultWorkerCount()}; 0 computes in the server thread)`, intOption('workers', 0, 64))
    .action(async (opts: ServeOptions) => {
      // The server's modules load only when it starts, so other commands start quickly.
      const [{ createApp }, { inlineInterpreter, pooledInterpreter }, { startServer }, { openCatalog }] = await Promise.all([
        import('../../api/app.ts'), import('../../api/interpreter.ts'), import('../../api/server.ts'), import('../../catalog/index.ts'),
      ]);
      const loopback = isLoopbackHost(opts.host);
      const catalog = openCatalog({ path: opts.db, env: io.env, cwd: io.cwd });
      const workers = opts.workers ?? defaultWorkerCount();
      const interpreter = workers === 0 ? inlineInterpreter() : await pooledInterpreter(workers);
      let hosts: string[] = [];
      const app = createApp({ catalog, interpreter, ...(loopback ? { allowedHosts: () => hosts } : {}) });
      try {
        const server = await startServer(app, { host: opts.host, port: opts.port });
        // Listen for the stop signal before announcing the address, so a client that
        // stops the server as soon as it reads the address is always heard.
        const stopped = stopSignal();
        hosts = loopbackHostHeaders(opts.host, server.port);
        if (!loopback) {
          io.err(`warning: listening on ${opts.host}, which other machines can reach. The API has no login and can change the catalog; use --host 127.0.0.1 unless that is what you want.`);
        }
        io.err(`hesper serve: ${server.url}/ (API under /api, OpenAPI at /api/openapi.json; catalog ${catalog.path}; ${workers} worker${workers === 1 ? '' : 's'}). Ctrl-C stops.`);
        const signal = await stopped;
        io.err(`hesper serve: ${signal}, stopping`);
        await server.close();
      } finally {
        await interpreter.close();
        catalog.close();
      }
    });
}
