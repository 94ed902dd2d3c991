import { memo, useMemo } from "react";
import type { NodeProps } from "@xyflow/react";
import { Caption } from "@/features/editor/components/nodes/Caption";
import { InPort, OutPort } from "@/features/editor/components/nodes/Ports";
import { frameClass, strokeColor } from "@/features/editor/components/nodes/nodeStyle";
import { Tex } from "@/features/editor/components/Tex";
import { expressionLatex } from "@/features/editor/lib/exprLatex";
import type { NodeOf } from "@/features/editor/lib/flowModel";

/** The expression as a typeset formula, or the raw text in mono when it does not parse yet. */
function Formula({ expr }: { expr: string }) {
  const latex = useMemo(() => expressionLatex(expr), [expr]);
  if (latex === null) return <span className="block max-w-40 truncate font-mono text-xs text-fault">{expr || "∅"}</span>;
  return <Tex latex={latex} className="text-[15px]" />;
}

/** A transfer function G(s): a box holding its fraction. */
export const TransferNode = memo(function TransferNode({ data, selected }: NodeProps<NodeOf<"transfer">>) {
  return (
    <div className={`relative flex min-h-12 min-w-20 items-center justify-center rounded-sm border-2 px-3 py-1.5 ${frameClass(selected, data.highlighted, data.problem)}`}>
      <Caption block={data.block} />
      <Formula expr={data.block.expr} />
      <InPort />
      <OutPort />
    </div>
  );
});

/** An integrator: a box with 1/s and a doubled left edge, so it reads apart from a transfer block at a glance. */
export const IntegratorNode = memo(function IntegratorNode({ data, selected }: NodeProps<NodeOf<"integrator">>) {
  return (
    <div className={`relative flex h-12 w-16 items-center justify-center rounded-sm border-2 border-l-[5px] border-double ${frameClass(selected, data.highlighted, data.problem)}`}>
      <Caption block={data.block} />
      <Tex latex="\frac{1}{s}" className="text-[15px]" />
      <InPort />
      <OutPort />
    </div>
  );
});

/** A static gain: a triangle pointing the way the signal goes, its expression inside. */
export const GainNode = memo(function GainNode({ data, selected }: NodeProps<NodeOf<"gain">>) {
  const stroke = strokeColor(selected, data.highlighted, data.problem);
  const fill = data.highlighted ? "#f8ecd6" : "#fcfbf8";
  return (
    <div className="relative flex h-14 min-w-20 items-center pr-6 pl-2">
      <Caption block={data.block} />
      <svg aria-hidden className="absolute inset-0 size-full overflow-visible" preserveAspectRatio="none" viewBox="0 0 100 100">
        <polygon
          points="1,2 99,50 1,98"
          fill={fill}
          stroke={stroke}
          strokeWidth={2}
          strokeDasharray={data.problem === "error" && !selected && !data.highlighted ? "6 4" : undefined}
          vectorEffect="non-scaling-stroke"
        />
      </svg>
      <span className="relative">
        <Formula expr={data.block.expr} />
      </span>
      <InPort />
      <OutPort />
    </div>
  );
});
