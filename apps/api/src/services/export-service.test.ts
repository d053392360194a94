import { createServer, type Server } from 'node:http';
import { connect } from 'node:net';
import type { AddressInfo } from 'node:net';
import { afterEach, describe, expect, it } from 'vitest';
import { fileSlug, streamExport } from './export-service';

/** Polls `read` until it stops changing for `quietMs` (or `limitMs` passes); returns the last value. */
async function settled<T>(read: () => T, quietMs = 300, limitMs = 10_000): Promise<T> {
  const started = Date.now();
  let last = read();
  let since = Date.now();
  while (Date.now() - started < limitMs) {
    await new Promise((r) => setTimeout(r, 25));
    const now = read();
    if (now !== last) {
      last = now;
      since = Date.now();
    } else if (Date.now() - since >= quietMs) {
      break;
    }
  }
  return last;
}

describe('streamExport', () => {
  let server: Server | null = null;
  afterEach(async () => {
    await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
    server = null;
  });

  it('waits for drain while the client reads nothing, and stops pulling pieces when the client goes away', async () => {
    const piece = 'x'.repeat(1 << 20);
    let pulled = 0;
    let closed = false;
    let finished = false;
    async function* pieces(): AsyncGenerator<string, void, undefined> {
      try {
        for (let i = 0; i < 200; i += 1) {
          pulled += 1;
          yield piece;
        }
      } finally {
        closed = true;
      }
    }
    server = createServer((_req, res) => {
      void streamExport(res, { fileName: 'big.csv', contentType: 'text/csv; charset=utf-8', pieces: pieces() }).finally(() => {
        finished = true;
      });
    });
    await new Promise<void>((resolve) => server!.listen(0, '127.0.0.1', resolve));
    const socket = connect((server.address() as AddressInfo).port, '127.0.0.1');
    socket.pause(); // read nothing: only the kernel's socket buffers take bytes
    socket.write('GET /export HTTP/1.1\r\nHost: localhost\r\n\r\n');

    // Without backpressure all 200 MB would be pulled at once; with it, what the buffers hold.
    const pulledWhileStalled = await settled(() => pulled);
    expect(pulledWhileStalled).toBeGreaterThan(0);
    expect(pulledWhileStalled).toBeLessThan(40);
    expect(closed).toBe(false);

    socket.destroy();
    await settled(() => (closed && finished ? 1 : 0), 50);
    expect(closed).toBe(true);
    expect(finished).toBe(true);
    expect(pulled).toBeLessThanOrEqual(pulledWhileStalled + 1);
  });

  it('sends every piece in order with the attachment headers', async () => {
    async function* pieces(): AsyncGenerator<string, void, undefined> {
      for (let i = 0; i < 5; i += 1) yield `line ${i}\n`;
    }
    server = createServer((_req, res) => void streamExport(res, { fileName: 'a-b-c.csv', contentType: 'text/csv; charset=utf-8', pieces: pieces() }));
    await new Promise<void>((resolve) => server!.listen(0, '127.0.0.1', resolve));
    const res = await fetch(`http://127.0.0.1:${(server.address() as AddressInfo).port}/`);
    expect(res.headers.get('content-disposition')).toBe('attachment; filename="a-b-c.csv"');
    expect(res.headers.get('content-type')).toBe('text/csv; charset=utf-8');
    expect(await res.text()).toBe('line 0\nline 1\nline 2\nline 3\nline 4\n');
  });
});

describe('fileSlug', () => {
  it.each([
    ['Corvina-2 — 30 days on station around the September equinox', 'corvina-2-30-days-on-station-around-the-september-equinox'],
    ['Étude à 0,9 UA', 'etude-a-0-9-ua'],
    ['  ***  ', 'scenario'],
  ])('%s becomes %s', (text, slug) => {
    expect(fileSlug(text, 'scenario')).toBe(slug);
  });

  it('keeps names short and never ends on a dash', () => {
    const slug = fileSlug(`${'a'.repeat(59)} b c`, 'x');
    expect(slug.length).toBeLessThanOrEqual(60);
    expect(slug.endsWith('-')).toBe(false);
  });
});
