/** Where the server listens by default, and which addresses count as this machine only. */

export const DEFAULT_PORT = 4173;
export const DEFAULT_HOST = '127.0.0.1';

/** True for names and addresses that reach this machine only. */
export function isLoopbackHost(host: string): boolean {
  const h = host.trim().toLowerCase().replace(/^\[|\]$/g, '');
  return h === 'localhost' || h === '::1' || /^127(\.\d{1,3}){3}$/.test(h);
}

/** The Host header values a loopback server answers to on `port`. */
export function loopbackHostHeaders(host: string, port: number): string[] {
  const h = host.trim().toLowerCase();
  const names = new Set([h.includes(':') && !h.startsWith('[') ? `[${h}]` : h, '127.0.0.1', 'localhost']);
  if (h === '::1' || h === '[::1]') names.add('[::1]');
  return [...names].map((n) => `${n}:${port}`);
}
