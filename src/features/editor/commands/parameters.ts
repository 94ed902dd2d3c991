import { hasExpression } from "@shared/diagram/blockKinds";
import { lexExpression } from "@shared/expr/lexer";
import { parameterNameSchema, parameterSpecSchema, type ParameterSpec } from "@shared/diagram/schema";
import { done, refuse, type EditorDoc, type Outcome } from "@/features/editor/commands/types";

/** One row of the parameter table, in the form the table edits. */
export interface ParameterFields {
  value: number;
  unit?: string;
  min?: number;
  max?: number;
  description?: string;
}

/** The row form of a stored spec (a bare number is a spec with only a value). */
export const parameterFields = (spec: ParameterSpec): ParameterFields => (typeof spec === "number" ? { value: spec } : { ...spec });

/** Stored compactly: a bare number when nothing but the value is set. */
function toSpec(f: ParameterFields): ParameterSpec {
  const extra = Object.entries(f).filter(([k, v]) => k !== "value" && v !== undefined && v !== "");
  return extra.length === 0 ? f.value : { value: f.value, ...Object.fromEntries(extra) };
}

const firstIssue = (r: { success: boolean; error?: { issues: { message: string }[] } }) => r.error?.issues[0]?.message ?? "";

/** Why `name` cannot name a parameter, or null. Uses the document schema's own rule and message. */
export function parameterNameRefusal(name: string): string | null {
  const r = parameterNameSchema.safeParse(name);
  return r.success ? null : `"${name}": ${firstIssue(r)}`;
}

/** Adds or replaces parameter `name` after checking the name and the spec against the document schema. */
export function setParameter(doc: EditorDoc, name: string, fields: ParameterFields): Outcome {
  const bad = parameterNameRefusal(name);
  if (bad) return refuse(bad);
  const spec = toSpec(fields);
  const r = parameterSpecSchema.safeParse(spec);
  if (!r.success) return refuse(`Parameter ${name}: ${firstIssue(r)}`);
  return done({ ...doc, parameters: { ...doc.parameters, [name]: spec } });
}

/** Block ids whose expression mentions parameter `name`. */
export function blocksUsing(doc: EditorDoc, name: string): string[] {
  return doc.blocks.flatMap((b) => {
    if (!hasExpression(b)) return [];
    const lexed = lexExpression(b.expr);
    return "tokens" in lexed && lexed.tokens.some((t) => t.kind === "name" && t.text === name) ? [b.id] : [];
  });
}

/** Rewrites every use of one name in an expression, token by token, so `K` in `Kp` is left alone. */
function renameIn(expr: string, from: string, to: string): string {
  const lexed = lexExpression(expr);
  if (!("tokens" in lexed)) return expr;
  let out = expr;
  for (const t of [...lexed.tokens].reverse()) {
    if (t.kind === "name" && t.text === from) out = out.slice(0, t.position) + to + out.slice(t.position + from.length);
  }
  return out;
}

/** Renames a parameter and every use of it in gain and transfer expressions, keeping its place in the table. */
export function renameParameter(doc: EditorDoc, from: string, to: string): Outcome {
  if (from === to) return done(doc);
  if (!(from in doc.parameters)) return refuse(`There is no parameter ${from}`);
  const bad = parameterNameRefusal(to);
  if (bad) return refuse(bad);
  if (to in doc.parameters) return refuse(`A parameter named ${to} already exists`);
  const parameters = Object.fromEntries(Object.entries(doc.parameters).map(([k, v]) => [k === from ? to : k, v]));
  const blocks = doc.blocks.map((b) =>
    hasExpression(b) && blocksUsing({ ...doc, blocks: [b] }, from).length > 0
      ? { ...b, expr: renameIn(b.expr, from, to) }
      : b,
  );
  return done({ ...doc, parameters, blocks });
}

/** Removes a parameter no expression uses; otherwise says which blocks still use it. */
export function removeParameter(doc: EditorDoc, name: string): Outcome {
  if (!(name in doc.parameters)) return refuse(`There is no parameter ${name}`);
  const users = blocksUsing(doc, name);
  if (users.length > 0) return refuse(`Parameter ${name} is used by ${users.map((id) => `"${id}"`).join(", ")}; change those expressions first`);
  const { [name]: _gone, ...parameters } = doc.parameters;
  return done({ ...doc, parameters });
}

/** Names used in gain and transfer expressions that the parameter table does not declare, in first-use order. */
export function undeclaredNames(doc: EditorDoc): string[] {
  const seen = new Set<string>();
  for (const b of doc.blocks) {
    if (!hasExpression(b)) continue;
    const lexed = lexExpression(b.expr);
    if (!("tokens" in lexed)) continue;
    for (const t of lexed.tokens) if (t.kind === "name" && t.text !== "s" && !(t.text in doc.parameters)) seen.add(t.text);
  }
  return [...seen];
}
