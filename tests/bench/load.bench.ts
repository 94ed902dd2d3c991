import autocannon from "autocannon";
import { ladderDiagram } from "./diagrams";
import { startLiveServer } from "./liveServer";
import { seedDiagram } from "./seed";

/**
 * HTTP load benchmark: the compiled server (what `npm start` runs) on loopback against the bench database, a
 * bounded autocannon run per route — the health check, a signed-in team's diagram list and a diagram fetch.
 * Prints requests per second and latency percentiles; asserts nothing. The client shares the machine's cores
 * with the server and PostgreSQL, so these figures are a floor.
 * Run: BENCH_DATABASE_URL=postgres://… npx tsx tests/bench/load.bench.ts (or `npm run bench load`).
 */
const SECONDS = 3;
const CONNECTIONS = 10;
const BLOCKS = 60;

interface Row {
  route: string;
  requests: number;
  perSecond: number;
  p50: number;
  p90: number;
  p99: number;
  max: number;
  failures: number;
}

async function measure(route: string, url: string, headers: Record<string, string>): Promise<Row> {
  const r = await autocannon({ url, headers, connections: CONNECTIONS, duration: SECONDS, timeout: 10 });
  return {
    route,
    requests: r.requests.total,
    perSecond: Math.round(r.requests.average),
    p50: r.latency.p50,
    p90: r.latency.p90,
    p99: r.latency.p99,
    max: r.latency.max,
    failures: r.non2xx + r.errors + r.timeouts,
  };
}

async function main() {
  const databaseUrl = process.env.BENCH_DATABASE_URL;
  if (!databaseUrl) throw new Error("BENCH_DATABASE_URL is not set (npm run bench sets it)");
  const live = await startLiveServer(databaseUrl, { compiled: true });
  try {
    const { id, teamId, storageState } = await seedDiagram(live.baseUrl, ladderDiagram(BLOCKS), `Ladder of ${BLOCKS} blocks`);
    const cookie = { Cookie: storageState.cookies.map((c) => `${c.name}=${c.value}`).join("; ") };
    const rows = [
      await measure("GET /api/health", `${live.baseUrl}/api/health`, {}),
      await measure("GET /api/teams/:id/diagrams (signed in)", `${live.baseUrl}/api/teams/${teamId}/diagrams`, cookie),
      await measure(`GET /api/diagrams/:id (${BLOCKS} blocks, signed in)`, `${live.baseUrl}/api/diagrams/${id}`, cookie),
    ];
    console.log(`\n${CONNECTIONS} connections, ${SECONDS} s per route, loopback, compiled server`);
    console.table(
      rows.map((r) => ({
        route: r.route,
        requests: r.requests,
        "req/s": r.perSecond,
        "p50 ms": r.p50,
        "p90 ms": r.p90,
        "p99 ms": r.p99,
        "max ms": r.max,
        failed: r.failures,
      })),
    );
    const failed = rows.filter((r) => r.failures > 0);
    if (failed.length) console.log(`✗ failed answers on ${failed.map((r) => r.route).join(", ")}: the figures above are not the route's own`);
  } finally {
    await live.stop();
  }
}

await main();
