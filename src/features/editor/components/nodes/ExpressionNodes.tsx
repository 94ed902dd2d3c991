import type { NodeProps } from "@xyflow/react";
import { useMemo } from "react";
import { delayLatex } from "@shared/expr/exprLatex";
import { Caption } from "@/features/editor/components/nodes/Caption";
import { blockMemo } from "@/features/editor/components/nodes/blockMemo";
import { useFarView } from "@/features/editor/components/nodes/farView";
import { Formula, PlainFraction } from "@/features/editor/components/nodes/Formula";
import { InPort, OutPort } from "@/features/editor/components/nodes/Ports";
import { frameClass, strokeColor } from "@/features/editor/components/nodes/nodeStyle";
import { Tex } from "@/features/editor/components/Tex";
import type { NodeOf } from "@/features/editor/lib/flowModel";

/** A transfer function G(s): a box holding its fraction. */
export const TransferNode = blockMemo(function TransferNode({ data, selected }: NodeProps<NodeOf<"transfer">>) {
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
export const IntegratorNode = blockMemo(function IntegratorNode({ data, selected }: NodeProps<NodeOf<"integrator">>) {
  const far = useFarView();
  return (
    <div className={`relative flex h-12 w-16 items-center justify-center rounded-sm border-2 border-l-[5px] border-double ${frameClass(selected, data.highlighted, data.problem)}`}>
      <Caption block={data.block} />
      {far ? <PlainFraction num="1" den="s" /> : <Tex latex="\frac{1}{s}" className="text-[15px]" />}
      <InPort />
      <OutPort />
    </div>
  );
});

/** A static gain: a triangle pointing the way the signal goes, its expression inside. */
export const GainNode = blockMemo(function GainNode({ data, selected }: NodeProps<NodeOf<"gain">>) {
  const stroke = strokeColor(selected, data.highlighted, data.problem);
  const fill = data.highlighted ? "#f8ecd6" : "#fcfbf8";
  return (
    <div className="relative flex h-14 min-w-20 items-center pr-6 pl-2">
      <Caption block={data.block} />
      {/* Behind the formula by z-order, so the formula needs no positioned wrapper of its own. */}
      <svg aria-hidden className="absolute inset-0 -z-10 size-full overflow-visible" preserveAspectRatio="none" viewBox="0 0 100 100">
        <polygon
          points="1,2 99,50 1,98"
          fill={fill}
          stroke={stroke}
          strokeWidth={2}
          strokeDasharray={data.problem === "error" && !selected && !data.highlighted ? "6 4" : undefined}
          vectorEffect="non-scaling-stroke"
        />
      </svg>
      <Formula expr={data.block.expr} />
      <InPort />
      <OutPort />
    </div>
  );
});

/** A dead time e^(−sT): a parallelogram leaning the way time runs, T typeset in the exponent. */
export const DelayNode = blockMemo(function DelayNode({ data, selected }: NodeProps<NodeOf<"delay">>) {
  const far = useFarView();
  const stroke = strokeColor(selected, data.highlighted, data.problem);
  const fill = data.highlighted ? "#f8ecd6" : "#fcfbf8";
  const latex = useMemo(() => delayLatex(data.block.expr), [data.block.expr]);
  return (
    <div className="relative flex h-12 min-w-22 items-center justify-center px-5">
      <Caption block={data.block} />
      <svg aria-hidden className="absolute inset-0 -z-10 size-full overflow-visible" preserveAspectRatio="none" viewBox="0 0 100 100">
        <polygon
          points="12,2 99,2 88,98 1,98"
          fill={fill}
          stroke={stroke}
          strokeWidth={2}
          strokeDasharray={data.problem === "error" && !selected && !data.highlighted ? "6 4" : undefined}
          vectorEffect="non-scaling-stroke"
        />
      </svg>
      {latex === null ? (
        <span className="font-mono text-xs text-fault">{data.block.expr || "∅"}</span>
      ) : far ? (
        <span className="font-serif text-[15px] whitespace-nowrap italic">e^(−{data.block.expr}·s)</span>
      ) : (
        <Tex latex={latex} className="text-[15px]" />
      )}
      <InPort />
      <OutPort />
    </div>
  );
});
