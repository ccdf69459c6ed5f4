import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// Each e2e test file runs in its own worker module registry: give it a fresh database.
process.env.DATABASE_PATH = join(mkdtempSync(join(tmpdir(), 'tiermode-e2e-')), 'test.sqlite');
process.env.JWT_SECRET = 'e2e-secret-that-is-long-enough-for-hs256-0123456789';
process.env.DEMO = 'on';
// The per-person limit on costly routes is tested in rate-limit.e2e-spec.ts; elsewhere it
// would only trip suites that make hundreds of analyses as one user.
process.env.RATE_LIMIT_PER_MINUTE = '1000000';
