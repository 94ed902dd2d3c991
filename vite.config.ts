import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { fileURLToPath } from "node:url";
import ports from "./shared/ports.json" with { type: "json" };

const at = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const apiServer = `http://127.0.0.1:${ports.app}`;

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: { "@shared": at("./shared"), "@": at("./src") },
  },
  build: {
    outDir: "dist/client",
    emptyOutDir: true,
    // The editor route carries KaTeX, the canvas library and the exact algebra (~850 kB raw, ~260 kB gzip);
    // it is split from the first page, which stays small.
    chunkSizeWarningLimit: 1000,
    // Read by the server to announce a page's chunks in the HTML of its link (server/http/clientPages.ts).
    manifest: true,
  },
  server: {
    port: ports.vite,
    strictPort: true,
    proxy: { "/api": apiServer, "/dev": apiServer },
  },
});
