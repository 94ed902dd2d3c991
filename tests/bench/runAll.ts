import { readdirSync } from "node:fs";
import { spawnSync } from "node:child_process";

// `npm run bench [name]`: every tests/bench/*.bench.ts (or those whose name contains `name`) in turn, each printing
// its own table of figures.
const dir = "tests/bench";
const only = process.argv[2];
let failed = 0;
for (const file of readdirSync(dir).filter((f) => f.endsWith(".bench.ts") && (!only || f.includes(only))).sort()) {
  console.log(`\n=== ${file} ===`);
  const r = spawnSync("node_modules/.bin/tsx", [`${dir}/${file}`], { stdio: "inherit" });
  if (r.status !== 0) failed++;
}
process.exit(failed ? 1 : 0);
