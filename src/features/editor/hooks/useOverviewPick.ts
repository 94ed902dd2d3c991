import { useCallback, useLayoutEffect, useRef } from "react";
import type { OnEdgesChange, OnNodesChange } from "@xyflow/react";
import type { OverviewPick } from "@/features/editor/components/OverviewLayer";
import type { FlowNode, SignalEdge } from "@/features/editor/lib/flowModel";

/**
 * A block picked in the overview becomes the same selection changes a click on a live block makes: alone, or
 * added to (taken out of) the selection. Reads the latest selection through a ref, so the overview's blocks
 * keep one handler and stay memoised.
 */
export function useOverviewPick(nodes: FlowNode[], edges: SignalEdge[], onNodesChange: OnNodesChange<FlowNode>, onEdgesChange: OnEdgesChange<SignalEdge>) {
  const current = useRef({ nodes, edges });
  useLayoutEffect(() => {
    current.current = { nodes, edges };
  });
  return useCallback(
    ({ id, additive }: OverviewPick) => {
      const { nodes: all, edges: wires } = current.current;
      const was = all.find((n) => n.id === id)?.selected ?? false;
      const others = additive ? [] : all.filter((n) => n.selected && n.id !== id).map((n) => ({ type: "select" as const, id: n.id, selected: false }));
      onNodesChange([...others, { type: "select", id, selected: additive ? !was : true }]);
      if (!additive) onEdgesChange(wires.filter((e) => e.selected).map((e) => ({ type: "select" as const, id: e.id, selected: false })));
    },
    [onNodesChange, onEdgesChange],
  );
}
