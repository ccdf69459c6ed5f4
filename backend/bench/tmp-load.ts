import autocannon from 'autocannon';
import { tower } from './load-run';
const base = 'http://127.0.0.1:4411';
async function main() {
  const r = await fetch(base + '/api/auth/login', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: 'designer@tiermode.test', password: 'tiermode-demo' }) });
  const { accessToken } = (await r.json()) as any;
  const n = Number(process.argv[2] ?? 200);
  for (const d of [4, 10]) {
  const result = await autocannon({ url: base, duration: d, timeout: 10, connections: 50, requests: [{ method: 'POST', path: '/api/analysis?detail=summary', headers: { authorization: `Bearer ${accessToken}`, 'content-type': 'application/json' }, body: JSON.stringify(tower(n)) }] });
  console.log(Date.now(), { rps: result.requests.average, errors: result.errors });
  }
}
main();
