import { spawn } from "node:child_process";
import ports from "@shared/ports.json" with { type: "json" };

// `npm run dev`: the API server restarting on change, and Vite with hot reload proxying /api to it.
const children = [
  spawn("node_modules/.bin/tsx", ["watch", "server/main.ts"], { stdio: "inherit", env: { ...process.env, PUBLIC_URL: `http://localhost:${ports.vite}` } }),
  spawn("node_modules/.bin/vite", [], { stdio: "inherit" }),
];
const stop = () => children.forEach((c) => c.kill("SIGTERM"));
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
children.forEach((c) => c.on("exit", () => (stop(), process.exit(0))));
