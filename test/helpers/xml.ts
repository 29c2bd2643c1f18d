/**
 * A strict, small XML 1.0 well-formedness parser for test assertions (no DTDs): one
 * root element, matched tags, quoted unique attributes, known entities only. Throws
 * with the offset of the first problem. Enough to check that an SVG "parses as XML".
 */
export interface XmlElement {
  name: string;
  attrs: Record<string, string>;
  children: XmlElement[];
  /** Text directly inside this element, entities decoded. */
  text: string;
}

const NAME = /^[A-Za-z_:][-A-Za-z0-9_:.]*/;
const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

function decode(s: string, at: number): string {
  return s.replace(/&([^;\s&]*);?/g, (m, body: string) => {
    if (!m.endsWith(';')) throw new Error(`bare & at ${at}`);
    if (body.startsWith('#x')) return String.fromCodePoint(parseInt(body.slice(2), 16));
    if (body.startsWith('#')) return String.fromCodePoint(parseInt(body.slice(1), 10));
    const e = ENTITIES[body];
    if (e === undefined) throw new Error(`unknown entity &${body}; at ${at}`);
    return e;
  });
}

export function parseXml(src: string): XmlElement {
  let i = 0;
  const fail = (msg: string): never => {
    throw new Error(`XML: ${msg} at offset ${i}`);
  };
  const skipPast = (close: string, what: string) => {
    const end = src.indexOf(close, i);
    if (end < 0) fail(`unterminated ${what}`);
    i = end + close.length;
  };
  const skipMisc = () => {
    for (;;) {
      while (/\s/.test(src[i] ?? '')) i++;
      if (src.startsWith('<?', i)) skipPast('?>', 'processing instruction');
      else if (src.startsWith('<!--', i)) skipPast('-->', 'comment');
      else return;
    }
  };
  const element = (): XmlElement => {
    if (src[i] !== '<') fail('expected <');
    i++;
    const name = NAME.exec(src.slice(i))?.[0] ?? fail('bad element name');
    i += name.length;
    const attrs: Record<string, string> = {};
    for (;;) {
      const ws = /^\s*/.exec(src.slice(i))![0].length;
      i += ws;
      if (src.startsWith('/>', i)) {
        i += 2;
        return { name, attrs, children: [], text: '' };
      }
      if (src[i] === '>') {
        i++;
        break;
      }
      if (ws === 0) fail('attributes must be separated by white space');
      const an = NAME.exec(src.slice(i))?.[0] ?? fail('bad attribute name');
      i += an.length;
      const m = /^\s*=\s*(["'])/.exec(src.slice(i)) ?? fail(`attribute ${an} needs ="value"`);
      i += m[0].length;
      const end = src.indexOf(m[1]!, i);
      if (end < 0) fail('unterminated attribute value');
      const raw = src.slice(i, end);
      if (raw.includes('<')) fail('< inside an attribute value');
      if (an in attrs) fail(`duplicate attribute ${an}`);
      attrs[an] = decode(raw, i);
      i = end + 1;
    }
    const children: XmlElement[] = [];
    let text = '';
    for (;;) {
      if (i >= src.length) fail(`unclosed <${name}>`);
      if (src.startsWith('</', i)) {
        i += 2;
        const close = NAME.exec(src.slice(i))?.[0];
        if (close !== name) fail(`</${close}> closes <${name}>`);
        i += name.length;
        while (/\s/.test(src[i] ?? '')) i++;
        if (src[i] !== '>') fail('expected > after closing tag');
        i++;
        return { name, attrs, children, text };
      }
      if (src.startsWith('<!--', i)) {
        skipPast('-->', 'comment');
      } else if (src.startsWith('<![CDATA[', i)) {
        const end = src.indexOf(']]>', i);
        if (end < 0) fail('unterminated CDATA');
        text += src.slice(i + 9, end);
        i = end + 3;
      } else if (src[i] === '<') {
        children.push(element());
      } else {
        const next = src.indexOf('<', i);
        const chunk = src.slice(i, next < 0 ? src.length : next);
        text += decode(chunk, i);
        i += chunk.length;
      }
    }
  };
  skipMisc();
  const root = element();
  skipMisc();
  if (i !== src.length) fail('content after the root element');
  return root;
}

/** Every element of a tree, depth first. */
export function allElements(e: XmlElement): XmlElement[] {
  return [e, ...e.children.flatMap(allElements)];
}
