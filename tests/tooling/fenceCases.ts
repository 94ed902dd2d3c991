import { readdirSync } from "node:fs";

// Each case is a scratch file in a zone: the forbidden ones name the rule that must report it and a fragment of its
// message (the offending specifier and whose fence refused it), the allowed ones must lint clean.

export interface AllowedCase {
  file: string;
  code: string;
}
export interface ForbiddenCase extends AllowedCase {
  rule: string;
  says: string;
}

// Two real feature folders: the config generates one block per folder it finds.
const [own, other] = readdirSync(new URL("../../src/features/", import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

const probe = "__fence_probe__";
const fence = "fence/imports";
const shared = "shared/ is pure";
const client = "src/ runs in the browser";
const server = "server/ imports shared/";
const otherFeature = `src/features/${own} imports no other feature`;

const sharedTs = `shared/${probe}.ts`;
const ownFeature = `src/features/${own}/${probe}.tsx`;
const serverTs = `server/${probe}.ts`;
const serverMjs = `server/${probe}.mjs`;

/** A package import the zone's fence refuses; by default the code is a bare `import "<specifier>"`. */
const refusedPackage = (file: string, specifier: string, zone: string, code = `import "${specifier}";`) => ({
  file,
  code,
  rule: fence,
  says: `the package "${specifier}": ${zone}`,
});
/** An import of a repository folder the zone's fence refuses, with the folder the fence resolved. */
const refusedPath = (
  file: string,
  specifier: string,
  folder: string,
  zone: string,
  code = `import "${specifier}";`,
) => ({
  file,
  code,
  rule: fence,
  says: `"${specifier}" (it resolves to ${folder}): ${zone}`,
});
const refusedGlobal = (name: string, code: string, file = sharedTs) => ({
  file,
  code,
  rule: "no-restricted-globals",
  says: `Unexpected use of '${name}'. shared/ runs in the browser, its workers and Node alike`,
});

export const forbidden: ForbiddenCase[] = [
  refusedPackage(sharedTs, "react-dom/client", shared),
  refusedPackage(sharedTs, "@xyflow/react", shared),
  refusedPackage(sharedTs, "sequelize/lib/model", shared, `import type { Model } from "sequelize/lib/model";
export type Row = Model;`),
  refusedPackage(sharedTs, "fs/promises", shared),
  refusedPackage(sharedTs, "node:fs", shared, `export * from "node:fs";`),
  refusedPackage(sharedTs, "mathjs", shared),
  refusedPackage(sharedTs, "node:path", shared, `export const load = () => import("node:path");`),
  refusedPackage(sharedTs, "react", shared, `export type Fc = import("react").FC;`),
  refusedPackage(`shared/${probe}.tsx`, "react", shared),
  refusedPackage(`shared/${probe}.mjs`, "node:fs", shared),
  refusedPackage(`shared/${probe}.js`, "fs", shared, `export const fs = require("fs");`),
  refusedPath(sharedTs, "@/lib/x", "src/lib/x", shared),
  refusedPath(sharedTs, "@server/config", "server/config", shared),
  refusedPath(sharedTs, "../src/main", "src/main", shared),
  refusedPath(`shared/algebra/${probe}.ts`, "../../server/config", "server/config", shared),
  refusedPath(sharedTs, "tests/support/arbitraries", "tests/support/arbitraries", shared),
  refusedGlobal("require", `export const fs = require("fs");`, `shared/${probe}.js`),
  refusedGlobal("document", `export const title = () => document.title;`),
  refusedGlobal("window", `export const width = () => window.innerWidth;`),
  refusedGlobal("process", `export const env = () => process.env;`),
  {
    file: sharedTs,
    code: `export const env = () => globalThis.process;`,
    rule: "no-restricted-properties",
    says: "'globalThis.process' is restricted from being used. shared/ runs",
  },
  {
    file: sharedTs,
    code: `/// <reference types="node" />\nexport {};`,
    rule: "@typescript-eslint/triple-slash-reference",
    says: "Do not use a triple slash reference for node",
  },

  refusedPackage(ownFeature, "sequelize", client),
  refusedPackage(ownFeature, "pg", client),
  refusedPackage(ownFeature, "express", client),
  refusedPackage(ownFeature, "node:fs", client),
  refusedPackage(`src/lib/${probe}.ts`, "path", client),
  refusedPackage(`src/${probe}.mjs`, "pg-boss", client),
  refusedPath(ownFeature, "@server/config", "server/config", client),
  refusedPath(ownFeature, "../../../server/config", "server/config", client),
  refusedPath(ownFeature, `@/features/${other}/x`, `src/features/${other}/x`, otherFeature),
  refusedPath(`src/features/${own}/${probe}.ts`, `../${other}/x`, `src/features/${other}/x`, otherFeature),

  refusedPath(serverTs, "@/main", "src/main", server),
  refusedPath(`server/http/${probe}.mjs`, "../../src/lib/x", "src/lib/x", server),
  refusedPackage(serverTs, "react", server),
  refusedPackage(`server/${probe}.tsx`, "@xyflow/react", server),
  refusedPackage(serverMjs, "react-dom/server", server),
  refusedPackage(serverMjs, "@tanstack/react-query", server),
];

const imports = (...specifiers: string[]) => specifiers.map((s) => `import "${s}";`).join("\n");

export const allowed: AllowedCase[] = [
  // A local binding that shares a host global's name is no host global.
  {
    file: sharedTs,
    code: `${imports("zod", "mathjs/number", "nerdamer", "nerdamer/Algebra.js", "@shared/diagram/schema")}
export const next = (process: number) => process + 1;`,
  },
  { file: `shared/algebra/${probe}.ts`, code: imports("../diagram/schema", "./poly") },
  {
    file: ownFeature,
    code: imports("react", "@xyflow/react", "@shared/api/teams", "@/lib/x", `@/features/${own}/x`, "./x"),
  },
  { file: `src/app/${probe}.tsx`, code: imports(`@/features/${own}/x`, `@/features/${other}/x`) },
  { file: serverMjs, code: imports("express", "node:fs", "@shared/diagram/schema", "./config") },
];
