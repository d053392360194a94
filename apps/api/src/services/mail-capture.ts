/**
 * A local stand-in for an SMTP relay: accepts every message on loopback and hands what it received
 * (envelope recipients, subject, plain text) to `onMessage`. The start command stores them in
 * `mail_messages` for the administrators' mail page; tests listen on port 0.
 */
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { MailMessageModel } from '../models';

/** What the capture server received. */
export interface CapturedMail {
  to: string[];
  from: string;
  subject: string;
  text: string;
}

export interface MailCapture {
  port: number;
  /** `smtp://127.0.0.1:<port>`: what PL_SMTP_URL should say. */
  url: string;
  close(): Promise<void>;
}

/** Starts the capture server on `host:port` (port 0 picks a free one). */
export async function startMailCapture(options: { host?: string; port?: number; onMessage: (mail: CapturedMail) => Promise<void> }): Promise<MailCapture> {
  const host = options.host ?? '127.0.0.1';
  const server = new SMTPServer({
    // Loopback only, no credentials, no TLS: a capture box, never a relay to the outside.
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 1024 * 1024,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', (err: Error) => callback(err));
      stream.on('end', () => {
        const parsed = parseMessage(Buffer.concat(chunks).toString('utf8'));
        const to = session.envelope.rcptTo.map((r) => r.address);
        const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
        options
          .onMessage({ to, from, subject: parsed.subject, text: parsed.text })
          .then(() => callback())
          .catch((err: unknown) => callback(err instanceof Error ? err : new Error(String(err))));
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => resolve());
  });
  const port = (server.server.address() as AddressInfo).port;
  return {
    port,
    url: `smtp://${host}:${port}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/** Stores a captured message in `mail_messages`. */
export async function storeCapturedMail(mail: CapturedMail): Promise<void> {
  await MailMessageModel.create({ toAddresses: mail.to, fromAddress: mail.from, subject: mail.subject, text: mail.text });
}

/** Subject and plain text of a MIME message (single part, or the first text/plain part of a multipart one). */
export function parseMessage(raw: string): { subject: string; text: string } {
  const { headers, body } = splitHeaders(raw);
  const subject = decodeWords(headers.get('subject') ?? '');
  return { subject, text: textOf(headers, body) };
}

function splitHeaders(raw: string): { headers: Map<string, string>; body: string } {
  const normalised = raw.replace(/\r\n/g, '\n');
  const end = normalised.indexOf('\n\n');
  const head = end < 0 ? normalised : normalised.slice(0, end);
  const body = end < 0 ? '' : normalised.slice(end + 2);
  const headers = new Map<string, string>();
  // Folded header lines continue with whitespace.
  for (const line of head.replace(/\n[ \t]+/g, ' ').split('\n')) {
    const colon = line.indexOf(':');
    if (colon > 0) headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function textOf(headers: Map<string, string>, body: string): string {
  const type = headers.get('content-type') ?? 'text/plain';
  const boundary = /boundary="?([^";]+)"?/i.exec(type)?.[1];
  if (/^multipart\//i.test(type) && boundary) {
    for (const part of body.split(`--${boundary}`).slice(1)) {
      if (part.startsWith('--')) break;
      const inner = splitHeaders(part.replace(/^\n/, ''));
      const innerType = inner.headers.get('content-type') ?? 'text/plain';
      if (/^(text\/plain|multipart\/)/i.test(innerType)) return textOf(inner.headers, inner.body);
    }
    return '';
  }
  return decodeBody(body, headers.get('content-transfer-encoding') ?? '7bit').replace(/\n$/, '');
}

function decodeBody(body: string, encoding: string): string {
  switch (encoding.toLowerCase()) {
    case 'base64':
      return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8');
    case 'quoted-printable':
      return decodeQuotedPrintable(body);
    default:
      return body;
  }
}

function decodeQuotedPrintable(text: string): string {
  const bytes: number[] = [];
  const joined = text.replace(/=\n/g, '');
  for (let i = 0; i < joined.length; i += 1) {
    const c = joined[i]!;
    const hex = joined.slice(i + 1, i + 3);
    if (c === '=' && /^[0-9A-F]{2}$/i.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(c, 'utf8'));
    }
  }
  return Buffer.from(bytes).toString('utf8');
}

/** RFC 2047 encoded words (`=?UTF-8?Q?...?=`, `=?UTF-8?B?...?=`). */
function decodeWords(value: string): string {
  return value
    .replace(/\?=\s+=\?/g, '?==?')
    .replace(/=\?([^?]+)\?([BQ])\?([^?]*)\?=/gi, (_m, _charset: string, kind: string, data: string) =>
      kind.toUpperCase() === 'B' ? Buffer.from(data, 'base64').toString('utf8') : decodeQuotedPrintable(data.replace(/_/g, ' ')),
    );
}
