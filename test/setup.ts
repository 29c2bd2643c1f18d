import { afterEach, beforeEach, vi } from 'vitest';

// A warning is a failure unless the test expects it.
// Tests that want console output spy on console themselves; this guard only
// catches writes nobody asked for.
const methods = ['log', 'info', 'warn', 'error', 'debug'] as const;
let stray: string[] = [];

beforeEach(() => {
  stray = [];
  for (const m of methods) {
    vi.spyOn(console, m).mockImplementation((...args: unknown[]) => {
      stray.push(`console.${m}: ${args.map(String).join(' ')}`);
    });
  }
});

afterEach(() => {
  vi.restoreAllMocks();
  if (stray.length > 0) {
    const lines = stray.join('\n');
    stray = [];
    throw new Error(`unexpected console output during test:\n${lines}`);
  }
});
