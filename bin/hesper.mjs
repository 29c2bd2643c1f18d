#!/usr/bin/env node
// Entry point for `npx hesper`: registers the TypeScript loader, then runs the CLI.
import { register } from 'tsx/esm/api';

// A reader that stops early (`hesper catalog export | head`) is not an error.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (e) => {
    if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
}

register();
const { main } = await import('../src/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
