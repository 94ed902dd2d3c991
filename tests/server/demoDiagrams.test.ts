import { expect, it } from "vitest";
import { demoDiagrams } from "@server/db/demoDiagrams";
import { reduceDocument } from "@shared/reduce/reduceDiagram";

// The demo must open as working loops: every seeded document reduces without problems.
it.each(demoDiagrams.map((d) => [d.title, d.document] as const))("%s reduces cleanly", (_title, document) => {
  const outcome = reduceDocument(document);
  expect(outcome.ok ? [] : outcome.problems).toEqual([]);
});

it("the level loop's disturbance path matches the hand derivation below (common practice: block-diagram algebra)", () => {
  // q_out enters negatively before the integrator 1/s; with r = 0, h = (1/s)(-K/(2s+1)·h - q), so
  // H/Q = -(2s+1) / (2s^2 + s + K), monic: -(s + 1/2) / (s^2 + s/2 + K/2).
  const level = demoDiagrams.find((d) => d.title === "Stock chest level loop")!;
  const outcome = reduceDocument(level.document, { input: "q_out", output: "h" });
  expect(outcome.ok).toBe(true);
  if (!outcome.ok) return;
  const [pair] = outcome.result.transfers;
  expect(pair.numerator.replace(/\s/g, "")).toBe("-s-1/2");
  expect(pair.denominator.replace(/\s/g, "")).toBe("s^2+1/2*s+1/2*K");
});
