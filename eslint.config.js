import { readdirSync } from "node:fs";
import { builtinModules } from "node:module";
import tseslint from "typescript-eslint";
import fence from "./eslint.fence.js";

// The one-way doors of the layout, by folder zone: shared/ is pure; server/ and src/ never import each other;
// one client feature never imports another. The rule `fence/imports` (eslint.fence.js) resolves each specifier
// and checks it against the zone's fences; tests/tooling/importFence.test.ts proves each door is shut.

const codeFiles = (folder) => [`${folder}/**/*.{js,mjs,cjs,ts,tsx,mts,cts}`];

const nodeOnlyPackages = [
  ...builtinModules,
  "node:*",
  "express",
  "express-*",
  "helmet",
  "multer",
  "sequelize",
  "sequelize-*",
  "pg",
  "pg-*",
  "umzug",
  "lucia",
  "@lucia-auth/*",
  "@node-rs/*",
  "nodemailer",
  "smtp-server",
  "mailparser",
  "pino",
  "pino-*",
  "tsx",
  "supertest",
  "autocannon",
  "@playwright/*",
];
const clientPackages = [
  "react",
  "react-*",
  "@xyflow/*",
  "@tanstack/*",
  "@hookform/*",
  "recharts",
  "katex",
  "elkjs",
  "sonner",
  "lucide-react",
  "@fontsource/*",
  "tailwindcss",
  "@tailwindcss/*",
];

const sharedFence = {
  because: "shared/ is pure TypeScript for both sides: it imports only zod, mathjs/number, nerdamer and shared/.",
  allowPackages: ["zod", "mathjs/number", "nerdamer"],
  allowFolders: ["shared"],
};
const clientFence = {
  because: "src/ runs in the browser: it imports src/, shared/ and client packages, not server/, tests or Node.",
  denyPackages: nodeOnlyPackages,
  allowFolders: ["src", "shared"],
};
const serverFence = {
  because: "server/ imports shared/ and server packages, never src/ or a client package.",
  denyPackages: clientPackages,
  allowFolders: ["server", "shared", "migrations", "seeders"],
};
const features = readdirSync(new URL("./src/features/", import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);
const featureFence = (feature) => ({
  because: `src/features/${feature} imports no other feature: share through src/lib, src/components or shared/.`,
  denyFolders: features.filter((other) => other !== feature).map((other) => `src/features/${other}`),
});

// What exists in only one of the runtimes shared/ serves; its tsconfig (lib ES2022, no types) refuses them too.
const hostGlobals = [
  "document",
  "window",
  "self",
  "navigator",
  "location",
  "localStorage",
  "sessionStorage",
  "fetch",
  "XMLHttpRequest",
  "process",
  "Buffer",
  "global",
  "require",
  "module",
  "__dirname",
  "__filename",
  "setImmediate",
];
const hostMessage = "shared/ runs in the browser, its workers and Node alike: pass in what the host provides.";

export default tseslint.config(
  { ignores: ["dist/**", "node_modules/**", ".data/**", "test-results/**", "playwright-report/**"] },
  ...tseslint.configs.recommended,
  {
    plugins: { fence },
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  {
    files: codeFiles("shared"),
    rules: {
      "fence/imports": ["error", sharedFence],
      "no-restricted-globals": ["error", ...hostGlobals.map((name) => ({ name, message: hostMessage }))],
      "no-restricted-properties": [
        "error",
        ...hostGlobals.map((property) => ({ object: "globalThis", property, message: hostMessage })),
      ],
      "@typescript-eslint/triple-slash-reference": ["error", { path: "never", types: "never", lib: "never" }],
    },
  },
  { files: codeFiles("src"), rules: { "fence/imports": ["error", clientFence] } },
  ...features.map((feature) => ({
    files: codeFiles(`src/features/${feature}`),
    rules: { "fence/imports": ["error", clientFence, featureFence(feature)] },
  })),
  { files: codeFiles("server"), rules: { "fence/imports": ["error", serverFence] } },
);
