import autocannon, { type Options, type Result } from 'autocannon';

/**
 * The office workload against a running server (loopback only): many people listing projects
 * and calcs, reading calcs and analysing a 20-storey building, while others sign in; and, first,
 * the same server answering only /api/health, as the yardstick the workload is measured against.
 */
export interface LoadOptions {
  /** Seconds each phase runs. */
  duration: number;
  /** Connections of the workload (one of them signs in over and over). */
  connections: number;
}

export interface PhaseSummary {
  requestsPerSecond: number;
  p50Ms: number;
  p99Ms: number;
  requests: number;
  /** Connection errors, timeouts and answers other than 2xx. */
  errors: number;
  statusCounts: Record<string, number>;
}

/** One building analysed over and over by every connection, against /api/health. */
export interface AnalysisPhase extends PhaseSummary {
  storeys: number;
  detail: 'summary' | 'full';
  /** /api/health's requests per second, run just before this phase. */
  healthRequestsPerSecond: number;
  /** Its requests per second over that. */
  ratio: number;
  /** Issue 16's target for the ratio, where it sets one. */
  targetRatio?: number;
  meetsTarget?: boolean;
}

export interface LoadReport {
  options: LoadOptions;
  health: PhaseSummary;
  analysis: AnalysisPhase[];
  workload: PhaseSummary;
  signIn: PhaseSummary;
  /** Workload requests per second over /api/health requests per second, same connections. */
  throughputRatio: number;
}

const DEMO_PASSWORD = 'tiermode-demo';

/** An invented tower of n storeys: 4.5 m ground storey, 3.5 m above, mass and stiffness tapering. */
export function tower(n: number) {
  return {
    storeys: Array.from({ length: n }, (_, i) => ({
      mass: 6.5e5 * (1 - 0.3 * (i / n)),
      stiffness: 1.2e9 * (1 - 0.5 * (i / n)),
      height: i === 0 ? 4.5 : 3.5,
    })),
    spectrum: {
      points: [
        { period: 0, sa: 0.4 },
        { period: 0.15, sa: 1 },
        { period: 0.6, sa: 1 },
        { period: 8, sa: 0.075 },
      ],
    },
    dampingRatio: 0.05,
  };
}

function ensureLoopback(url: string): void {
  const host = new URL(url).hostname;
  if (!['127.0.0.1', 'localhost', '::1', '[::1]'].includes(host)) {
    throw new Error(`The load run only targets this machine (loopback), not ${host}`);
  }
}

async function json<T>(url: string, init: RequestInit): Promise<T> {
  const res = await fetch(url, {
    ...init,
    headers: { 'Content-Type': 'application/json', ...init.headers },
  });
  if (!res.ok) throw new Error(`${init.method ?? 'GET'} ${url} answered ${res.status}`);
  return (await res.json()) as T;
}

function run(options: Options): Promise<Result> {
  return new Promise((resolve, reject) => {
    autocannon(options, (error: unknown, result) =>
      error
        ? reject(error instanceof Error ? error : new Error('autocannon failed'))
        : resolve(result),
    );
  });
}

function summarise(result: Result): PhaseSummary {
  const statusCounts: Record<string, number> = {};
  for (const [code, count] of Object.entries(result.statusCodeStats ?? {})) {
    statusCounts[code] = (count as { count: number }).count;
  }
  return {
    requestsPerSecond: Math.round(result.requests.average * 10) / 10,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    requests: result.requests.total,
    errors: result.errors + result.timeouts + result.non2xx,
    statusCounts,
  };
}

export async function runLoad(baseUrl: string, options: LoadOptions): Promise<LoadReport> {
  ensureLoopback(baseUrl);
  const signIn = (role: string) =>
    json<{ accessToken: string }>(`${baseUrl}/api/auth/login`, {
      method: 'POST',
      body: JSON.stringify({ email: `${role}@tiermode.test`, password: DEMO_PASSWORD }),
    }).then((r) => r.accessToken);
  const designer = await signIn('designer');
  const student = await signIn('student');
  const auth = (token: string) => ({ authorization: `Bearer ${token}` });
  const library = await json<{ id: string }[]>(`${baseUrl}/api/library`, {
    headers: auth(student),
  });
  const calcs = await json<{ id: string }[]>(`${baseUrl}/api/calculations`, {
    headers: auth(designer),
  });
  if (library.length === 0 || calcs.length === 0) {
    throw new Error('The load run needs the demo data (DEMO=on): no calcs found');
  }

  const common = { url: baseUrl, duration: options.duration, timeout: 10 };
  const healthRun = () =>
    run({
      ...common,
      connections: options.connections,
      requests: [{ method: 'GET', path: '/api/health' }],
    });
  const analysisRun = (storeys: number, detail: 'summary' | 'full', duration: number) =>
    run({
      ...common,
      duration,
      connections: options.connections,
      requests: [
        {
          method: 'POST',
          path: `/api/analysis?detail=${detail}`,
          headers: { ...auth(designer), 'content-type': 'application/json' },
          body: JSON.stringify(tower(storeys)),
        },
      ],
    });

  // Each analysis phase: every connection posts the same building (issue 16's targets: 20 storeys
  // at 0.35 of /api/health or more, 200 storeys at 0.1, with no errors). The web app asks for the
  // summary; the whole answer, the contract's default, is measured beside it at 20 storeys.
  const analysisPhases: { storeys: number; detail: 'summary' | 'full'; target?: number }[] = [
    { storeys: 20, detail: 'full' },
    { storeys: 20, detail: 'summary', target: 0.35 },
    { storeys: 200, detail: 'summary', target: 0.1 },
  ];
  // Untimed first, so that no phase measures V8 compiling the code it runs.
  const warmUp = Math.max(1, Math.round(options.duration / 5));
  await run({
    ...common,
    duration: warmUp,
    connections: options.connections,
    requests: [{ method: 'GET', path: '/api/health' }],
  });
  for (const phase of analysisPhases) await analysisRun(phase.storeys, phase.detail, warmUp);

  const health = await healthRun();
  const analysisResults: AnalysisPhase[] = [];
  for (const phase of analysisPhases) {
    // This machine's speed drifts from minute to minute (by up to a half between runs a few
    // minutes apart), so each phase is measured against a yardstick run just before it.
    const yardstick = summarise(await healthRun()).requestsPerSecond;
    const result = summarise(await analysisRun(phase.storeys, phase.detail, options.duration));
    const ratio = Math.round((result.requestsPerSecond / yardstick) * 1000) / 1000;
    analysisResults.push({
      ...result,
      storeys: phase.storeys,
      detail: phase.detail,
      healthRequestsPerSecond: yardstick,
      ratio,
      ...(phase.target === undefined
        ? {}
        : { targetRatio: phase.target, meetsTarget: ratio >= phase.target && result.errors === 0 }),
    });
  }

  const analysis = JSON.stringify(tower(20));
  const workloadRequests: Options['requests'] = [
    { method: 'GET', path: '/api/projects', headers: auth(designer) },
    { method: 'GET', path: '/api/calculations?limit=50', headers: auth(designer) },
    { method: 'GET', path: `/api/calculations/${calcs[0].id}`, headers: auth(designer) },
    {
      method: 'POST',
      path: '/api/analysis?detail=summary',
      headers: { ...auth(designer), 'content-type': 'application/json' },
      body: analysis,
    },
    { method: 'GET', path: '/api/library', headers: auth(student) },
    { method: 'GET', path: `/api/calculations/${library[0].id}`, headers: auth(student) },
  ];
  const signInBody = JSON.stringify({
    email: 'reviewer@tiermode.test',
    password: DEMO_PASSWORD,
  });
  // One connection signs someone in once a second (far above an office's rate; each sign-in is
  // a bcrypt hash at cost 12, a few hundred ms of CPU on a worker thread); the rest are people
  // at work, as fast as the server answers.
  const [workload, signIns] = await Promise.all([
    run({
      ...common,
      connections: Math.max(1, options.connections - 1),
      requests: workloadRequests,
    }),
    run({
      ...common,
      connections: 1,
      overallRate: 1,
      requests: [
        {
          method: 'POST',
          path: '/api/auth/login',
          headers: { 'content-type': 'application/json' },
          body: signInBody,
        },
      ],
    }),
  ]);
  const healthSummary = summarise(health);
  const workloadSummary = summarise(workload);
  const signInSummary = summarise(signIns);
  const combinedRps = workloadSummary.requestsPerSecond + signInSummary.requestsPerSecond;
  return {
    options,
    health: healthSummary,
    analysis: analysisResults,
    workload: workloadSummary,
    signIn: signInSummary,
    throughputRatio: Math.round((combinedRps / healthSummary.requestsPerSecond) * 1000) / 1000,
  };
}

export function formatReport(report: LoadReport): string {
  const row = (name: string, p: PhaseSummary) =>
    `${name.padEnd(34)} ${String(p.requestsPerSecond).padStart(9)} ${String(p.p50Ms).padStart(8)} ${String(p.p99Ms).padStart(8)} ${String(p.errors).padStart(7)}`;
  return [
    `Load run: ${report.options.duration} s per phase, ${report.options.connections} connections, loopback`,
    `${'phase'.padEnd(34)} ${'req/s'.padStart(9)} ${'p50 ms'.padStart(8)} ${'p99 ms'.padStart(8)} ${'errors'.padStart(7)}`,
    row('/api/health only (the yardstick)', report.health),
    ...report.analysis.map(
      (a) =>
        `${row(`analyse ${a.storeys} storeys, ${a.detail}`, a)}   ratio ${a.ratio} of ${a.healthRequestsPerSecond}${
          a.targetRatio === undefined
            ? ''
            : ` (target >= ${a.targetRatio}: ${a.meetsTarget ? 'met' : 'NOT met'})`
        }`,
    ),
    row('workload (list, read, analyse 20)', report.workload),
    row('sign-in (1 a second, alongside)', report.signIn),
    `throughput ratio, workload + sign-in over /api/health: ${report.throughputRatio}`,
  ].join('\n');
}
