import { mkdtempSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { get, request, type IncomingMessage } from 'node:http';
import { DEMO_PASSWORD } from '../../src/database/demo-accounts';
import { REPO, startServer, type ServerProcess } from '../support/server-process';

/** A GET with exactly these headers, answering the raw (still compressed) bytes. */
function raw(
  url: string,
  headers: Record<string, string>,
): Promise<{
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: Buffer;
}> {
  return new Promise((done, fail) => {
    get(url, { headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () =>
        done({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }),
      );
    }).on('error', fail);
  });
}

/**
 * How the built server delivers (issue 16, first part): compressed answers and files where the
 * client asks, year-long caching of content-hashed assets only, and no source maps served.
 */
describe('Delivery of the web app and the API', () => {
  let server: ServerProcess;
  let token: string;
  const assets = readdirSync(join(REPO, 'frontend', 'dist', 'assets'));
  const script = assets.find((name) => /^index-.+\.js$/.test(name))!;

  beforeAll(async () => {
    const databasePath = join(mkdtempSync(join(tmpdir(), 'tiermode-delivery-')), 'd.sqlite');
    server = await startServer({ databasePath });
    const login = await fetch(`${server.url}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'designer@tiermode.test', password: DEMO_PASSWORD }),
    });
    token = ((await login.json()) as { accessToken: string }).accessToken;
  });
  afterAll(() => server?.stop());

  it('sends the app script brotli-compressed to a browser that accepts it, gzip to one that only takes gzip', async () => {
    const br = await raw(`${server.url}/assets/${script}`, {
      'Accept-Encoding': 'gzip, deflate, br',
    });
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    const text = brotliDecompressSync(br.body).toString('utf8');
    const gz = await raw(`${server.url}/assets/${script}`, { 'Accept-Encoding': 'gzip' });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gz.body).toString('utf8')).toBe(text);
    expect(br.body.length).toBeLessThan(text.length / 3);
    const plain = await raw(`${server.url}/assets/${script}`, {});
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body.toString('utf8')).toBe(text);
  });

  it('lets browsers keep content-hashed assets for a year, and checks the page itself each time', async () => {
    const asset = await raw(`${server.url}/assets/${script}`, {});
    expect(asset.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const page = await raw(`${server.url}/index.html`, {});
    expect(page.headers['cache-control']).toBe('no-cache');
  });

  it('serves no source map, and the script does not point to one', async () => {
    const map = assets.find((name) => name.endsWith('.map'));
    if (map) expect((await raw(`${server.url}/assets/${map}`, {})).status).toBe(404);
    expect((await raw(`${server.url}/assets/${script}.map`, {})).status).toBe(404);
    const plain = await raw(`${server.url}/assets/${script}`, {});
    expect(plain.body.toString('utf8')).not.toContain('sourceMappingURL');
  });

  it("puts no ETag on API answers, and keeps the static files' own", async () => {
    const health = await raw(`${server.url}/api/health`, {});
    expect(health.headers.etag).toBeUndefined();
    const asset = await raw(`${server.url}/assets/${script}`, {});
    expect(asset.headers.etag).toBeDefined();
  });

  it('compresses API answers too', async () => {
    const body = JSON.stringify({
      storeys: Array.from({ length: 20 }, () => ({ mass: 3e5, stiffness: 4e8, height: 3.5 })),
      spectrum: {
        points: [
          { period: 0, sa: 0.4 },
          { period: 0.5, sa: 1 },
          { period: 4, sa: 0.15 },
        ],
      },
      dampingRatio: 0.05,
    });
    const res = await new Promise<{
      encoding: string | undefined;
      etag: string | undefined;
      body: Buffer;
    }>((done, fail) => {
      const url = new URL(`${server.url}/api/analysis`);
      const req = request(
        url,
        {
          method: 'POST',
          headers: {
            Authorization: `Bearer ${token}`,
            'Content-Type': 'application/json',
            'Accept-Encoding': 'gzip',
          },
        },
        (r: IncomingMessage) => {
          const chunks: Buffer[] = [];
          r.on('data', (c: Buffer) => chunks.push(c));
          r.on('end', () =>
            done({
              encoding: r.headers['content-encoding'],
              etag: r.headers.etag,
              body: Buffer.concat(chunks),
            }),
          );
        },
      );
      req.on('error', fail);
      req.end(body);
    });
    expect(res.encoding).toBe('gzip');
    expect(res.etag).toBeUndefined();
    const answer = JSON.parse(gunzipSync(res.body).toString('utf8')) as { modes: unknown[] };
    expect(answer.modes).toHaveLength(20);
  });
});
