// Calls to the hesper HTTP API. Every answer is { ok, status, body }; error bodies
// have the shape { error: { code, message, issues: [{ path, message }] } }.

async function call(method, url, body, bodyIsText = false) {
  const init = { method, headers: { accept: 'application/json' } };
  if (body !== undefined) {
    init.headers['content-type'] = 'application/json';
    init.body = bodyIsText ? body : JSON.stringify(body);
  }
  let response;
  try {
    response = await fetch(url, init);
  } catch (e) {
    return { ok: false, status: 0, body: { error: { code: 'network', message: `the server did not answer (${e.message})`, issues: [] } } };
  }
  const type = response.headers.get('content-type') ?? '';
  const parsed = type.includes('json') ? await response.json() : await response.text();
  return { ok: response.ok, status: response.status, body: parsed };
}

export const api = {
  bands: () => call('GET', '/api/bands'),
  demos: () => call('GET', '/api/demos'),
  demo: (name) => call('GET', `/api/demos/${encodeURIComponent(name)}`),
  /** The write-up and the interpretation of a system; `system` is an object or JSON text. */
  report: (system, format) =>
    call('POST', `/api/report?format=${encodeURIComponent(format)}`, system, typeof system === 'string'),
  entries: (filter) => {
    const q = new URLSearchParams();
    for (const [k, v] of Object.entries(filter)) if (v) q.set(k, v);
    const s = q.toString();
    return call('GET', `/api/catalog/entries${s ? `?${s}` : ''}`);
  },
};
