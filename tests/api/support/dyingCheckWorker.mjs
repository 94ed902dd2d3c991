import { parentPort } from "node:worker_threads";

// A check worker whose job throws outside any try: the server sees the worker's 'error' event, not a reply.
parentPort.on("message", () => {
  throw new RangeError("Maximum call stack size exceeded (a test worker's stand-in for a runaway recursion)");
});
parentPort.postMessage("ready");
