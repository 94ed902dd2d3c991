import type { Problem } from "@shared/diagram/problems";
import type { Block } from "@shared/diagram/schema";
import type { LiveOutcome } from "@/features/editor/worker/liveProtocol";
import type { ReductionResult, ReductionStep, TransferResult } from "@shared/reduce/result";

export const pairKey = (t: Pick<TransferResult, "input" | "output">) => `${t.input}→${t.output}`;

/** A block as the pair selector names it: its label with its id, or the id alone. Example: "Speed reference (r)". */
export function blockName(blocks: readonly Pick<Block, "id" | "label">[] | undefined, id: string): string {
  const label = blocks?.find((b) => b.id === id)?.label?.trim();
  return label ? `${label} (${id})` : id;
}

/** A pair as the pair selector lists it. Example: "Speed reference (r) → Shaft speed (y)". */
export const pairName = (blocks: readonly Pick<Block, "id" | "label">[] | undefined, t: Pick<TransferResult, "input" | "output">) =>
  `${blockName(blocks, t.input)} → ${blockName(blocks, t.output)}`;

export interface ResultView {
  result: ReductionResult | null;
  transfers: TransferResult[];
  /** The pair the panel shows: the chosen one, else the first. */
  transfer: TransferResult | null;
  /** Steps of that pair's reduction (steps without a pair belong to every pair). */
  steps: ReductionStep[];
  problems: Problem[];
}

/** What the results panel and the canvas highlight show for a reduction outcome and a chosen pair. */
export function resultView(outcome: LiveOutcome | null, chosen: string | null): ResultView {
  if (!outcome) return { result: null, transfers: [], transfer: null, steps: [], problems: [] };
  if (!outcome.ok) return { result: null, transfers: [], transfer: null, steps: [], problems: outcome.problems };
  const { result } = outcome;
  const transfer = result.transfers.find((t) => pairKey(t) === chosen) ?? result.transfers[0] ?? null;
  const steps = transfer
    ? result.steps.filter((s) => s.input === undefined || (s.input === transfer.input && s.output === transfer.output))
    : [];
  return { result, transfers: result.transfers, transfer, steps, problems: result.warnings };
}
