import type { Problem } from "@shared/diagram/problems";
import type { ReductionResult, ReductionStep, TransferResult } from "@shared/reduce/result";

/** Plain-text rendering of problems and results for the `reduce` command. */

/** One line naming what the problem is about. Example: `error [unknown-name] block c, field expr, position 4: …`. */
export function formatProblem(p: Problem): string {
  const where = [
    p.blockId !== undefined && `block ${p.blockId}`,
    p.wireId !== undefined && (p.wireId.startsWith("wire #") ? p.wireId : `wire ${p.wireId}`), // unnamed: already "wire #i (a → b)"
    p.field !== undefined && `field ${p.field}`,
    p.position !== undefined && `position ${p.position}`,
  ].filter(Boolean);
  const related = p.related?.length ? ` (involves: ${p.related.join(", ")})` : "";
  return `${p.severity} [${p.code}]${where.length ? ` ${where.join(", ")}` : ""}: ${p.message}${related}`;
}

/** The expression and a caret under the offending character, when the problem points into one. */
export function caretLines(p: Problem, text: string | undefined): string[] {
  if (text === undefined || p.position === undefined || p.position > text.length) return [];
  return [`    ${text}`, `    ${" ".repeat(p.position)}^`];
}

const fmtRoot = ([re, im]: [number, number]): string => {
  const r = Number(re.toPrecision(6));
  if (Math.abs(im) < 1e-12) return String(r);
  const i = Number(Math.abs(im).toPrecision(6));
  return `${r} ${im < 0 ? "-" : "+"} ${i}j`;
};

function transferLines(t: TransferResult): string[] {
  const lines = [`${t.input} → ${t.output}:`, `  numerator:   ${t.numerator}`, `  denominator: ${t.denominator}`];
  for (const c of t.cancelled) {
    const flag = c.unstable ? "  ← HIDDEN UNSTABLE MODE" : "";
    lines.push(`  cancelled:   ${c.factor}   (roots: ${c.roots.map(fmtRoot).join(", ") || "none"})${flag}`);
  }
  return lines;
}

/** The steps in order of their pairs ("r → y"; "" for steps recorded without a pair). */
function stepsByPair(steps: readonly ReductionStep[]): Map<string, ReductionStep[]> {
  const groups = new Map<string, ReductionStep[]>();
  for (const s of steps) {
    const key = s.input === undefined ? "" : `${s.input} → ${s.output}`;
    groups.set(key, [...(groups.get(key) ?? []), s]);
  }
  return groups;
}

/** The readable report: each pair, the characteristic polynomial, the steps of each pair, the warnings. */
export function formatReport(result: ReductionResult, title: string | undefined): string {
  const lines: string[] = [];
  if (title) lines.push(title, "");
  lines.push("Transfer functions", "");
  for (const t of result.transfers) lines.push(...transferLines(t), "");
  lines.push(`Characteristic polynomial (all modes, nothing cancelled): ${result.characteristic}`, "");
  lines.push(`Reduction steps (${result.steps.length})`);
  for (const [pair, steps] of stepsByPair(result.steps)) {
    if (pair) lines.push(`  ${pair}:`);
    // Numbered from 1 within each pair, as the editor shows them.
    steps.forEach((step, k) => {
      lines.push(`    ${k + 1}. ${step.rule}: ${step.description}`);
      lines.push(`       ${step.produced} = ${step.expr}`);
      lines.push(`       consumed blocks: ${step.consumedBlocks.join(", ") || "none"}; wires: ${step.consumedWires.join(", ") || "none"}`);
    });
  }
  lines.push("", result.warnings.length ? `Warnings (${result.warnings.length})` : "Warnings: none");
  for (const w of result.warnings) lines.push(`  ${formatProblem(w)}`);
  return `${lines.join("\n")}\n`;
}
