import { rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { ESLint } from "eslint";
import ts from "typescript";
import { afterEach, describe, expect, it } from "vitest";
import { allowed, forbidden } from "./fenceCases";

// The layout's import fence bites: each forbidden import, written into a scratch file of its zone, is reported by
// `npx eslint .`'s own config; and shared/'s tsconfig refuses what only a browser or Node provides.

const root = fileURLToPath(new URL("../..", import.meta.url));
const eslint = new ESLint({ cwd: root });
const written: string[] = [];

function scratch(file: string, code: string): string {
  const at = join(root, file);
  writeFileSync(at, `${code}\n`);
  written.push(at);
  return at;
}

async function lintScratch(file: string, code: string) {
  const [result] = await eslint.lintFiles([scratch(file, code)]);
  return result.messages.map(({ ruleId, message }) => ({ ruleId, message }));
}

function compilerOptions(tsconfig: string): ts.CompilerOptions {
  const refuse = (d: ts.Diagnostic) => {
    throw new Error(ts.flattenDiagnosticMessageText(d.messageText, "\n"));
  };
  const host = { ...ts.sys, onUnRecoverableConfigFileDiagnostic: refuse };
  return ts.getParsedCommandLineOfConfigFile(join(root, tsconfig), {}, host)!.options;
}

afterEach(() => {
  for (const at of written.splice(0)) rmSync(at, { force: true });
});

describe("import fence (eslint)", () => {
  it.each(forbidden)("$file: $code is reported by $rule", async ({ file, code, rule, says }) => {
    const reports = (await lintScratch(file, code)).filter((m) => m.ruleId === rule);
    expect(reports).toHaveLength(1);
    expect(reports[0].message).toContain(says);
  });

  it.each(allowed)("$file: $code lints clean", async ({ file, code }) => {
    expect(await lintScratch(file, code)).toEqual([]);
  });
});

describe("shared/tsconfig.json", () => {
  it("refuses browser and Node globals that the whole-project tsconfig accepts", () => {
    const code = "export const host = [document.title, process.env, performance.now()];";
    const probe = scratch("shared/__fence_probe__.ts", code);
    const unknownNames = (tsconfig: string) => {
      const program = ts.createProgram([probe], compilerOptions(tsconfig));
      return ts
        .getPreEmitDiagnostics(program, program.getSourceFile(probe))
        .map((d) => ts.flattenDiagnosticMessageText(d.messageText, "\n"))
        .filter((text) => text.startsWith("Cannot find name"));
    };
    expect(unknownNames("shared/tsconfig.json")).toEqual([
      expect.stringContaining("'document'"),
      expect.stringContaining("'process'"),
      expect.stringContaining("'performance'"),
    ]);
    expect(unknownNames("tsconfig.json")).toEqual([]);
  });
});
