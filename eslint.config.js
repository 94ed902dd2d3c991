import tseslint from "typescript-eslint";

// The one-way doors of the layout: shared/ is pure; server/ and src/ never import each other.
const nodeBuiltins = ["fs", "path", "http", "https", "crypto", "child_process", "os", "url", "worker_threads", "net"];
// Bare package names go in `paths` (exact match); folder patterns in `patterns`.
const forbid = (groups, message) => {
  const bare = groups.filter((g) => !g.includes("*") && !g.includes("/"));
  const patterns = groups.filter((g) => !bare.includes(g));
  return {
    "no-restricted-imports": [
      "error",
      { paths: bare.map((name) => ({ name, message })), patterns: [{ group: patterns, message }] },
    ],
  };
};

export default tseslint.config(
  { ignores: ["dist/**", "node_modules/**", ".data/**", "test-results/**", "playwright-report/**"] },
  ...tseslint.configs.recommended,
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  {
    files: ["shared/**/*.ts"],
    rules: forbid(
      ["@/*", "@server/*", "react", "react-dom", "express", "sequelize", "pg", ...nodeBuiltins, "node:*", "**/src/*", "**/server/*"],
      "shared/ is pure TypeScript: no DOM, Node, server or client imports.",
    ),
  },
  {
    files: ["src/**/*.ts", "src/**/*.tsx"],
    rules: forbid(["@server/*", "**/server/*", ...nodeBuiltins, "node:*"], "The client depends on shared/, never on server/."),
  },
  {
    files: ["server/**/*.ts"],
    rules: forbid(["@/*", "**/src/*", "react", "react-dom"], "The server depends on shared/, never on src/."),
  },
);
