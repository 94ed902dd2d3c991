// Entry point of `npm run reduce`, `npm run analyze` and `npm run implement`: runs the compiled command-line tool in this same process
// (one node start-up, no tsx), compiling it first when a source is newer. Only the tool writes to stdout.
import { existsSync } from "node:fs";
import { pathToFileURL } from "node:url";
import { fail, setQuiet } from "./common.mjs";
import { buildCompiled, compiledPath } from "./build.mjs";
import { ensureNodeModules } from "./packages.mjs";

setQuiet();
const name = process.argv[2];
const tool = compiledPath(`tools/cli/${name}`);
ensureNodeModules();
await buildCompiled();
if (!existsSync(tool)) fail(`Unknown command-line tool "${name}". Use: reduce | analyze | implement`);
// The tool reads its arguments from process.argv, as when it is run directly: drop this script's own one.
process.argv.splice(2, 1);
await import(pathToFileURL(tool).href);
