// Just enough MIME (RFC 5322 headers, RFC 2045 transfer encodings, RFC 2046 multipart, RFC 2047
// encoded words) to read what nodemailer sends: subject, from, and the text and HTML bodies.

export type ParsedMail = {
  subject: string;
  from: string;
  to: string[];
  text: string;
  html: string | null;
  headers: Record<string, string>;
};

type Part = { headers: Record<string, string>; body: string };

function splitHeaders(raw: string): Part {
  const m = /\r?\n\r?\n/.exec(raw);
  const head = m ? raw.slice(0, m.index) : raw;
  const body = m ? raw.slice(m.index + m[0].length) : '';
  const headers: Record<string, string> = {};
  // Unfold continuation lines (RFC 5322 2.2.3), then split name: value.
  for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
    const i = line.indexOf(':');
    if (i <= 0) continue;
    const name = line.slice(0, i).trim().toLowerCase();
    // First occurrence wins: the top of the message carries the one that matters.
    headers[name] ??= line.slice(i + 1).trim();
  }
  return { headers, body };
}

function decodeBytes(bytes: Uint8Array, charset = 'utf-8'): string {
  try {
    return new TextDecoder(charset.toLowerCase()).decode(bytes);
  } catch {
    return new TextDecoder('utf-8').decode(bytes);
  }
}

function binaryBytes(s: string): Uint8Array {
  const out = new Uint8Array(s.length);
  for (let i = 0; i < s.length; i++) out[i] = s.charCodeAt(i) & 0xff;
  return out;
}

/** Quoted-printable (RFC 2045 6.7) to bytes; `underscoreSpace` for the Q encoding of RFC 2047. */
export function decodeQuotedPrintable(s: string, underscoreSpace = false): Uint8Array {
  const src = (underscoreSpace ? s.replace(/_/g, ' ') : s).replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < src.length; i++) {
    const hex = src.slice(i + 1, i + 3);
    if (src[i] === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      // Text here is UTF-8 already (the raw message was read as latin1, one char per byte).
      bytes.push(src.charCodeAt(i) & 0xff);
    }
  }
  return Uint8Array.from(bytes);
}

/** Decodes RFC 2047 encoded words (=?charset?B|Q?...?=); whitespace between adjacent words is dropped. */
export function decodeWords(value: string): string {
  const decoded = value.replace(/\?=\s+=\?/g, '?==?');
  return decoded.replace(
    /=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g,
    (_all, charset: string, enc: string, text: string) => {
      const bytes =
        enc.toUpperCase() === 'B'
          ? Uint8Array.from(Buffer.from(text, 'base64'))
          : decodeQuotedPrintable(text, true);
      return decodeBytes(bytes, charset.split('*')[0]);
    },
  );
}

function param(header: string, name: string): string | undefined {
  const m = new RegExp(`;\\s*${name}\\s*=\\s*(?:"([^"]*)"|([^;\\s]+))`, 'i').exec(header);
  return m ? (m[1] ?? m[2]) : undefined;
}

function decodeBody(part: Part): string {
  const cte = (part.headers['content-transfer-encoding'] ?? '7bit').toLowerCase();
  const charset = param(part.headers['content-type'] ?? '', 'charset') ?? 'utf-8';
  let bytes: Uint8Array;
  if (cte === 'base64') bytes = Uint8Array.from(Buffer.from(part.body.replace(/\s+/g, ''), 'base64'));
  else if (cte === 'quoted-printable') bytes = decodeQuotedPrintable(part.body);
  else bytes = binaryBytes(part.body);
  return decodeBytes(bytes, charset).replace(/\r\n/g, '\n');
}

function leaves(part: Part, depth = 0): Part[] {
  const type = (part.headers['content-type'] ?? 'text/plain').toLowerCase();
  const boundary = param(part.headers['content-type'] ?? '', 'boundary');
  if (!type.startsWith('multipart/') || !boundary || depth > 10) return [part];
  const out: Part[] = [];
  const chunks = part.body.split(new RegExp(`\\r?\\n?--${boundary.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`));
  // chunks[0] is the preamble; the one after the closing delimiter starts with "--".
  for (const chunk of chunks.slice(1)) {
    if (chunk.startsWith('--')) break;
    out.push(...leaves(splitHeaders(chunk.replace(/^[ \t]*\r?\n/, '')), depth + 1));
  }
  return out;
}

function isAttachment(p: Part): boolean {
  return /^\s*attachment/i.test(p.headers['content-disposition'] ?? '');
}

function htmlToText(html: string): string {
  return html
    .replace(/<(script|style)[\s\S]*?<\/\1>/gi, '')
    .replace(/<br\s*\/?>|<\/p>|<\/div>|<\/h\d>|<\/li>/gi, '\n')
    .replace(/<a\s[^>]*href="([^"]*)"[^>]*>([\s\S]*?)<\/a>/gi, '$2 ($1)')
    .replace(/<[^>]+>/g, '')
    .replace(/&nbsp;/g, ' ')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&')
    .replace(/\n{3,}/g, '\n\n')
    .trim();
}

/**
 * Parses a raw message. `raw` must be the bytes read as latin1 (one char per byte) so that
 * 8-bit bodies decode with their declared charset.
 */
export function parseMail(raw: string, envelopeTo: string[] = []): ParsedMail {
  const top = splitHeaders(raw);
  const parts = leaves(top).filter((p) => !isAttachment(p));
  const typeOf = (p: Part) => (p.headers['content-type'] ?? 'text/plain').toLowerCase();
  const textPart = parts.find((p) => typeOf(p).startsWith('text/plain'));
  const htmlPart = parts.find((p) => typeOf(p).startsWith('text/html'));
  const html = htmlPart ? decodeBody(htmlPart) : null;
  // Raw 8-bit header bytes are UTF-8 (RFC 6532); encoded words are decoded on top of that.
  const headerValue = (v: string) => decodeWords(decodeBytes(binaryBytes(v)));
  const headers: Record<string, string> = {};
  for (const [k, v] of Object.entries(top.headers)) headers[k] = headerValue(v);
  const headerTo = (headers.to ?? '')
    .split(',')
    .map((s) => s.trim())
    .filter(Boolean);
  return {
    subject: headers.subject ?? '',
    from: headers.from ?? '',
    to: envelopeTo.length ? envelopeTo : headerTo,
    text: textPart ? decodeBody(textPart) : html ? htmlToText(html) : '',
    html,
    headers,
  };
}
