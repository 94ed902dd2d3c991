import type { NodeProps } from "@xyflow/react";
import { Caption } from "@/features/editor/components/nodes/Caption";
import { blockMemo } from "@/features/editor/components/nodes/blockMemo";
import { InPort, OutPort } from "@/features/editor/components/nodes/Ports";
import { frameClass } from "@/features/editor/components/nodes/nodeStyle";
import type { NodeOf } from "@/features/editor/lib/flowModel";

const terminal = "relative flex h-9 min-w-14 items-center justify-center border-2 px-3 font-mono text-sm";

/** An external signal entering the loop: a tab with a flat right edge pointing into the diagram. */
export const InputNode = blockMemo(function InputNode({ data, selected }: NodeProps<NodeOf<"input">>) {
  return (
    <div className={`${terminal} rounded-l-full rounded-r-sm ${frameClass(selected, data.highlighted, data.problem)}`}>
      <span aria-hidden className="mr-1 text-[10px] font-sans font-semibold tracking-wide text-signal uppercase">in</span>
      {data.block.label ?? data.block.id}
      <OutPort />
    </div>
  );
});

/** A signal the user observes: the mirror tab. */
export const OutputNode = blockMemo(function OutputNode({ data, selected }: NodeProps<NodeOf<"output">>) {
  return (
    <div className={`${terminal} rounded-l-sm rounded-r-full ${frameClass(selected, data.highlighted, data.problem)}`}>
      <InPort />
      {data.block.label ?? data.block.id}
      <span aria-hidden className="ml-1 text-[10px] font-sans font-semibold tracking-wide text-signal uppercase">out</span>
    </div>
  );
});

/** A pickoff point: a dot the signal passes through unchanged to several wires. */
export const BranchNode = blockMemo(function BranchNode({ data, selected }: NodeProps<NodeOf<"branch">>) {
  const fill = data.highlighted ? "bg-trace" : selected ? "bg-signal" : data.problem === "error" ? "bg-fault" : "bg-ink";
  return (
    <div className="relative flex size-4 items-center justify-center">
      <Caption block={data.block} />
      <span className={`size-3 rounded-full ${fill} ${selected || data.highlighted ? "ring-4 ring-signal-tint" : ""}`} />
      <InPort style={{ left: 0 }} />
      <OutPort style={{ right: 0 }} />
    </div>
  );
});
