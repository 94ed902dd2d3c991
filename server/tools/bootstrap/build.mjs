// Builds run by the bootstrap, each skipped while its output is newer than every source it comes from: the client
// (Vite) and the compiled server and command-line tools (esbuild) that `npm start` and the CLI scripts run with
// plain `node`.
import { existsSync, readFileSync, readdirSync, statSync, writeFileSync } from "node:fs";
import { basename, join } from "node:path";
import { ROOT, bin, run, step } from "./common.mjs";

/** Newest modification time of the files under the given root-relative paths (0 when none exist). */
function newestMtime(paths) {
  let newest = 0;
  const walk = (p) => {
    if (!existsSync(p)) return;
    const st = statSync(p);
    if (st.isDirectory()) for (const name of readdirSync(p)) walk(join(p, name));
    else newest = Math.max(newest, st.mtimeMs);
  };
  paths.forEach((p) => walk(join(ROOT, p)));
  return newest;
}

const isFresh = (marker, sources) => existsSync(marker) && statSync(marker).mtimeMs >= newestMtime(sources);

export function buildClient(outDir) {
  const sources = ["src", "shared", "index.html", "vite.config.ts", "tailwind.config.ts", "package-lock.json"];
  if (isFresh(join(ROOT, outDir, "index.html"), sources)) return;
  step(`Building the client into ${outDir}…`);
  run(bin("vite"), ["build", "--outDir", outDir, "--emptyOutDir", "--logLevel", "warn"], "The client build failed", { cwd: ROOT });
}

export const COMPILED_DIR = join(ROOT, "dist");
/** Where a compiled entry lands, e.g. compiledPath("tools/cli/reduce") → dist/tools/cli/reduce.js. */
export const compiledPath = (name) => join(COMPILED_DIR, `${name}.js`);

/**
 * Worker threads the server starts with `new Worker(new URL("./<entry>", import.meta.url))`. Next to the compiled
 * server, an entry file of the same name imports the compiled worker directly, where the source one registers tsx.
 */
const SERVER_WORKERS = [{ entry: "checkWorkerEntry.mjs", source: "server/features/versions/checkWorker.ts" }];

const ENTRIES = {
  "server/main": "server/main.ts",
  ...Object.fromEntries(SERVER_WORKERS.map((w) => [`server/${basename(w.source, ".ts")}`, w.source])),
  "tools/cli/reduce": "server/tools/cli/reduce.ts",
  "tools/cli/analyze": "server/tools/cli/analyze.ts",
  "tools/cli/implement": "server/tools/cli/implement.ts",
};

/**
 * Packages bundled into the output; every other one stays an import of node_modules. These are shared/'s pure
 * libraries: loaded as one file they start in a fraction of the time (mathjs's ESM build alone, hundreds of
 * files, took ~0.6 s to load; bundled, the reduce CLI's --help answers in ~0.2 s).
 */
const BUNDLED_PACKAGES = ["mathjs", "zod", "nerdamer"];

function externalPackages() {
  const { dependencies = {}, devDependencies = {} } = JSON.parse(readFileSync(join(ROOT, "package.json"), "utf8"));
  return Object.keys({ ...dependencies, ...devDependencies })
    .filter((name) => !BUNDLED_PACKAGES.includes(name))
    .flatMap((name) => [name, `${name}/*`]);
}

/** The server and the CLI tools bundled to ESM for node under dist/. */
export async function buildCompiled() {
  const stamp = join(COMPILED_DIR, ".compiled");
  if (isFresh(stamp, ["server", "shared", "package-lock.json", "tsconfig.json"])) return;
  step("Compiling the server and the command-line tools (esbuild)…");
  const { build } = await import("esbuild"); // only now: node_modules exist once the bootstrap got this far
  await build({
    absWorkingDir: ROOT,
    entryPoints: ENTRIES,
    outdir: COMPILED_DIR,
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    external: externalPackages(),
    tsconfig: join(ROOT, "tsconfig.json"), // the @shared/ and @server/ aliases
    sourcemap: "linked",
    logLevel: "warning",
  });
  for (const w of SERVER_WORKERS)
    writeFileSync(join(COMPILED_DIR, "server", w.entry), `import "./${basename(w.source, ".ts")}.js";\n`);
  writeFileSync(stamp, `${new Date().toISOString()}\n`);
}
