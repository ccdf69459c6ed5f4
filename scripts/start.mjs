// `npm start`: install when needed, build, migrate and seed, then serve on PORT (default 3000).
import { ensureInstalled, must, npm } from './lib.mjs';

await ensureInstalled();
await must('Build', npm(['run', 'build']));
await must('Migrate and seed', npm(['run', 'migrate', '-w', 'backend']));
process.exitCode = await npm(['run', 'serve']);
