import type { Severity } from "@shared/diagram/problems";

/** Outline of a block: reduction highlight wins over selection, which wins over a problem mark. */
export function frameClass(selected: boolean, highlighted: boolean, problem: Severity | null): string {
  if (highlighted) return "border-trace bg-trace-tint shadow-[0_0_0_3px_rgba(212,137,28,0.35)]";
  if (selected) return "border-signal bg-paper-raised shadow-[0_0_0_3px_rgba(29,92,99,0.25)]";
  if (problem === "error") return "border-fault border-dashed bg-paper-raised";
  if (problem === "warning") return "border-trace border-dashed bg-paper-raised";
  return "border-ink-soft bg-paper-raised";
}

/** Stroke colour of SVG-drawn blocks, same precedence as frameClass. */
export function strokeColor(selected: boolean, highlighted: boolean, problem: Severity | null): string {
  if (highlighted) return "#d4891c";
  if (selected) return "#1d5c63";
  if (problem === "error") return "#a23a2c";
  return "#4d5663";
}

/**
 * A port: 10 px square centred on the block's edge by negative margins instead of the library's translate,
 * which would give each of a large diagram's ~1,300 ports its own transform to composite on every pan frame.
 */
export const handleClass = "!size-2.5 !-m-[5px] !transform-none !rounded-[2px] !border-[1.5px] !border-ink-soft !bg-paper-raised";
