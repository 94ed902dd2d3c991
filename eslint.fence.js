import { readdirSync } from "node:fs";
import { dirname, relative, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import ts from "typescript";

// The import fence: each zone says which packages and which folders of the repository its files may import.
// Specifiers are resolved first (relative paths, tsconfig aliases, baseUrl paths), because the text alone cannot
// tell whether "../x" leaves a folder or whether "@/x" and "tests/x" point into another zone.

const root = dirname(fileURLToPath(import.meta.url));
const { compilerOptions } = ts.readConfigFile(resolve(root, "tsconfig.json"), ts.sys.readFile).config;
const baseUrl = compilerOptions.baseUrl === undefined ? null : resolve(root, compilerOptions.baseUrl);
// "@shared/*": ["shared/*"] becomes ["@shared/", <root>/shared/]; the longest prefix wins, as in the compiler.
const aliases = Object.entries(compilerOptions.paths ?? {})
  .map(([alias, [target]]) => [alias.replace(/\*$/, ""), resolve(baseUrl ?? root, target.replace(/\*$/, ""))])
  .sort(([a], [b]) => b.length - a.length);
const topFolders = new Set(readdirSync(baseUrl ?? root).filter((name) => name !== "node_modules"));

/** A pattern covers a name and its subpaths ("sequelize" covers "sequelize/lib/model"); "pg-*" covers "pg-boss". */
const covers = (pattern, name) =>
  pattern.endsWith("*") ? name.startsWith(pattern.slice(0, -1)) : name === pattern || name.startsWith(`${pattern}/`);

/** The file a specifier points to, as the compiler resolves it, or null when it names a package. */
function targetOf(specifier, filename) {
  if (/^\.\.?(\/|$)/.test(specifier)) return resolve(dirname(filename), specifier);
  const alias = aliases.find(([prefix]) => specifier.startsWith(prefix));
  if (alias) return resolve(alias[1], specifier.slice(alias[0].length));
  if (baseUrl && topFolders.has(specifier.split("/")[0])) return resolve(baseUrl, specifier);
  return null;
}

/** The repository path ("src/features/teams/api") a specifier points to, or null when it names a package. */
function folderOf(specifier, filename) {
  const target = targetOf(specifier, filename);
  return target && relative(root, target);
}

/** Whether a fence refuses a name: outside its allow-list, or inside its deny-list. */
const refuses = (name, allow, deny) =>
  (allow !== undefined && !allow.some((p) => covers(p, name))) || (deny ?? []).some((p) => covers(p, name));

const fenceSchema = {
  type: "object",
  properties: {
    because: { type: "string" },
    allowPackages: { type: "array", items: { type: "string" } },
    denyPackages: { type: "array", items: { type: "string" } },
    allowFolders: { type: "array", items: { type: "string" } },
    denyFolders: { type: "array", items: { type: "string" } },
  },
  required: ["because"],
  additionalProperties: false,
};

const imports = {
  meta: {
    type: "problem",
    docs: { description: "Each zone imports only the packages and repository folders its fences let through." },
    // One option object per fence; an import is reported by the first fence that refuses it.
    schema: { type: "array", items: fenceSchema },
    messages: {
      package: 'This file may not import the package "{{specifier}}": {{because}}',
      folder: 'This file may not import "{{specifier}}" (it resolves to {{folder}}): {{because}}',
    },
  },
  create(context) {
    const check = (source) => {
      if (typeof source?.value !== "string") return;
      const specifier = source.value.split("?")[0];
      const folder = folderOf(specifier, context.filename);
      const [name, allow, deny] =
        folder === null ? [specifier, "allowPackages", "denyPackages"] : [folder, "allowFolders", "denyFolders"];
      const fence = context.options.find((f) => refuses(name, f[allow], f[deny]));
      if (!fence) return;
      const messageId = folder === null ? "package" : "folder";
      context.report({ node: source, messageId, data: { specifier: source.value, folder, because: fence.because } });
    };
    const checkSource = (node) => check(node.source);
    return {
      ImportDeclaration: checkSource,
      ExportAllDeclaration: checkSource,
      ExportNamedDeclaration: checkSource,
      ImportExpression: checkSource,
      TSImportType: checkSource,
      TSExternalModuleReference: (node) => check(node.expression),
      'CallExpression[callee.name="require"]': (node) => check(node.arguments[0]),
    };
  },
};

export default { rules: { imports } };
