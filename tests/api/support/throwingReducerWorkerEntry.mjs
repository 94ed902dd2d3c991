// Registers the TypeScript loader in the worker thread, as the server's own check worker entry does.
import { tsImport } from "tsx/esm/api";

await tsImport("./throwingReducerWorker.ts", import.meta.url);
