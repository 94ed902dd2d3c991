// Worker threads do not inherit the TypeScript loader of their parent in every runner (vitest, tsx):
// register it here, then load the TypeScript worker.
import { tsImport } from "tsx/esm/api";

await tsImport("./checkWorker.ts", import.meta.url);
