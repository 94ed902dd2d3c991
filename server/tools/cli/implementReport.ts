import { differenceEquation, digits17, METHOD_NAMES } from "@shared/implement/differenceEquation";
import type { DiscretiseOptions } from "@shared/implement/discretise";
import type { Implementation } from "@shared/implement/implement";
import type { Matrix } from "@shared/algebra/matrix";
import { upText } from "@shared/analysis/upoly";

/** The readable report of `implement` (without --json): the transfers, the difference equation, C code, matrices. */

const matrixLines = (name: string, m: Matrix): string[] =>
  m.length === 0 || m[0].length === 0 ? [`  ${name} = [] (no states)`] : [`  ${name} =`, ...m.map((row) => `    ${row.map(digits17).join("  ")}`)];

export function formatImplementation(done: Implementation, d: DiscretiseOptions | undefined, title: string | undefined): string {
  const { subject, tf, result, realisation } = done;
  const lines = [...(title ? [title, ""] : []), `${subject.what}:  G(s) = (${upText(tf.num)})/(${upText(tf.den)})`, ""];
  if (result.discrete && d) {
    const eq = differenceEquation(result.discrete, { ...d, id: subject.id ?? "controller" });
    lines.push(
      `Discrete equivalent, ${METHOD_NAMES[d.method]}${d.method === "prewarp" ? ` at ${d.prewarp} rad/s` : ""}, Ts = ${d.ts} s:`,
      `  b (z^0, z^-1, …): ${eq.b.map(digits17).join(", ")}`,
      `  a (z^0, z^-1, …): ${eq.a.map(digits17).join(", ")}`,
      "",
      eq.text,
      "",
      eq.code,
      "",
    );
  }
  const basis = realisation.basis === realisation.form ? "" : ` (${realisation.basis})`;
  lines.push(`State space, ${realisation.form} form${basis}: dx/dt = A x + B u, y = C x + D u`);
  const { A, B, C, D } = result.stateSpace;
  lines.push(...matrixLines("A", A), ...matrixLines("B", B), ...matrixLines("C", C), ...matrixLines("D", D));
  if (realisation.hankel) lines.push(`  Hankel singular values: ${realisation.hankel.map((x) => Number(x.toPrecision(6))).join(", ")}`);
  return `${lines.join("\n")}\n`;
}
