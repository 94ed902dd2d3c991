import type { z } from "zod";
import type { Problem } from "@shared/diagram/problems";
import { wireLabel } from "@shared/diagram/schema";

/**
 * Turns zod issues of a diagram document into Problems that name the block (its id, else `blocks[i]`),
 * the wire (`wireLabel`) and the field, so a hand-edited file points at the exact spot.
 * Example: path blocks[3].signs[1] → { blockId: "e", field: "signs[1]", code: "invalid-field" }.
 */
export function schemaProblems(issues: z.core.$ZodIssue[], raw: Record<string, unknown>): Problem[] {
  return issues.map((issue) => toProblem(issue, raw));
}

type Path = readonly PropertyKey[];

const formatPath = (path: Path): string =>
  path.map((key, i) => (typeof key === "number" ? `[${key}]` : `${i === 0 ? "" : "."}${String(key)}`)).join("");

const text = (v: unknown): string => (typeof v === "string" ? v : JSON.stringify(v) ?? String(v));

/** Who the issue is about, the Problem field, and the part of the path a message still needs to name. */
function subject(path: Path, raw: Record<string, unknown>): { at: Partial<Problem>; name: string; field?: string; detail?: string } {
  const [head, index, ...rest] = path;
  const list = raw[String(head)];
  const tail = rest.length > 0 ? formatPath(rest) : undefined;
  if ((head === "blocks" || head === "wires") && typeof index === "number" && Array.isArray(list)) {
    const item = (list[index] ?? {}) as Record<string, unknown>;
    if (head === "blocks") {
      const blockId = typeof item.id === "string" && item.id !== "" ? item.id : `blocks[${index}]`;
      const name = item.id === blockId ? `Block "${blockId}"` : `Block ${blockId}`;
      return { at: { blockId }, name, field: tail, detail: tail };
    }
    const id = typeof item.id === "string" && item.id !== "" ? item.id : undefined;
    const wireId = wireLabel({ id, from: text(item.from ?? "?"), to: text(item.to ?? "?") }, index);
    return { at: { wireId }, name: id ? `Wire "${id}"` : wireId.replace(/^wire/, "Wire"), field: tail, detail: tail };
  }
  const field = path.length > 0 ? formatPath(path) : undefined;
  if (head === "parameters" && index !== undefined) return { at: {}, name: `Parameter "${String(index)}"`, field, detail: tail };
  return { at: {}, name: "The document", field, detail: field };
}

function toProblem(issue: z.core.$ZodIssue, raw: Record<string, unknown>): Problem {
  const { at, name, field, detail } = subject(issue.path, raw);
  const where = detail ? `${name}, field ${detail}` : name;
  const base = { severity: "error" as const, ...at, ...(field ? { field } : {}) };
  if (issue.code === "invalid_union" && "discriminator" in issue && issue.discriminator === "type") {
    const value = raw.blocks && issue.path.length >= 2 ? (raw.blocks as Record<string, unknown>[])[issue.path[1] as number]?.type : undefined;
    const options = (issue as { options?: unknown[] }).options?.join(", ") ?? "";
    const message = value === undefined ? `${name} has no type: use one of ${options}` : `${name} has unknown type ${JSON.stringify(value)}: use one of ${options}`;
    return { ...base, code: value === undefined ? "missing-field" : "unknown-block-type", message };
  }
  if (issue.code === "invalid_type" && issue.message.endsWith("received undefined")) {
    return { ...base, code: "missing-field", message: `${where} is missing (expected ${issue.expected})` };
  }
  return { ...base, code: "invalid-field", message: `${where}: ${explain(issue, issue.path[0] === "parameters")}` };
}

function explain(issue: z.core.$ZodIssue, isParameter: boolean): string {
  if (issue.code === "invalid_key") {
    return `this name is not allowed — ${issue.issues[0]?.message ?? issue.message}`;
  }
  if (issue.code === "invalid_union") {
    // Report the branch that got furthest: its nested path says which sub-field is wrong.
    const deepest = issue.errors.flat().sort((a, b) => b.path.length - a.path.length)[0];
    const detail = deepest ? `${deepest.path.length ? `${formatPath(deepest.path)}: ` : ""}${plain(deepest.message)}` : "";
    const expected = isParameter ? "a number or { value, unit?, min?, max?, description? }" : "one of the allowed forms";
    return `expected ${expected}${detail ? ` (${detail})` : ""}`;
  }
  return plain(issue.message);
}

const plain = (message: string): string => message.replace(/^Invalid (input|option): /, "");
