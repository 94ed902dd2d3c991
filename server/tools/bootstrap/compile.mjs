// `node server/tools/bootstrap/compile.mjs`: compiles the server and the CLI tools into dist/ when a source is newer
// (what `npm start` does before serving), for benchmarks and for a look at the output.
import { buildCompiled } from "./build.mjs";
import { ensureNodeModules } from "./packages.mjs";

ensureNodeModules();
await buildCompiled();
