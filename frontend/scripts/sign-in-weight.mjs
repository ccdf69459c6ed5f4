/**
 * `npm run bench -w frontend` (after a build): the JavaScript the sign-in page loads, gzipped,
 * against the target of 250 KB (issue 16), and the largest chunks the other pages load on demand.
 * The sign-in page loads the scripts index.html names (its entry and any modulepreload): every
 * other page's code is split off and fetched with that page.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';

const dist = new URL('../dist/', import.meta.url).pathname;
const TARGET_KB = 250;
const html = readFileSync(join(dist, 'index.html'), 'utf8');
const scripts = [
  ...html.matchAll(/<script[^>]+src="([^"]+\.js)"/g),
  ...html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+\.js)"/g),
].map((m) => m[1]);
const kb = (bytes) => Math.round(bytes / 102.4) / 10;
const sizes = (file) => {
  const body = readFileSync(join(dist, file));
  return {
    raw: body.length,
    gzip: gzipSync(body, { level: 9 }).length,
    // What the server sends a browser that asks for brotli (quality 4, app.setup.ts).
    brotli: brotliCompressSync(body, { params: { [constants.BROTLI_PARAM_QUALITY]: 4 } }).length,
  };
};
const signIn = scripts
  .map(sizes)
  .reduce(
    (sum, s) => ({ raw: sum.raw + s.raw, gzip: sum.gzip + s.gzip, brotli: sum.brotli + s.brotli }),
    { raw: 0, gzip: 0, brotli: 0 },
  );
const chunks = readdirSync(join(dist, 'assets'))
  .filter((f) => f.endsWith('.js'))
  .map((f) => ({ file: f, gzipKB: kb(sizes(join('assets', f)).gzip) }))
  .sort((a, b) => b.gzipKB - a.gzipKB);
console.log(
  JSON.stringify({
    signInPage: {
      scripts: scripts.length,
      rawKB: kb(signIn.raw),
      gzipKB: kb(signIn.gzip),
      brotliQ4KB: kb(signIn.brotli),
      targetGzipKB: TARGET_KB,
      meetsTarget: signIn.gzip <= TARGET_KB * 1024,
    },
    allScriptsGzipKB: kb(chunks.reduce((sum, c) => sum + c.gzipKB * 1024, 0)),
    largestOnDemandChunks: chunks
      .filter((c) => !scripts.some((s) => s.endsWith(c.file)))
      .slice(0, 5),
  }),
);
