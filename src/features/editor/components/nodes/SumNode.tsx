import { Fragment, type CSSProperties } from "react";
import { Handle, Position, type NodeProps } from "@xyflow/react";
import { toggleSign } from "@/features/editor/commands/sum";
import { useEditorActions } from "@/features/editor/components/EditorContext";
import { Caption } from "@/features/editor/components/nodes/Caption";
import { blockMemo } from "@/features/editor/components/nodes/blockMemo";
import { useFarView } from "@/features/editor/components/nodes/farView";
import { OutPort } from "@/features/editor/components/nodes/Ports";
import { handleClass, strokeColor } from "@/features/editor/components/nodes/nodeStyle";
import { sumDiameter, sumPortPlaces, type PortPlace } from "@shared/geometry/sumPorts";
import { inHandle, type NodeOf } from "@/features/editor/lib/flowModel";

const POSITION = { left: Position.Left, top: Position.Top, bottom: Position.Bottom } as const;

/**
 * Where a port's handle sits on the circle's bounding square, and where its 12-px sign box is drawn just inside
 * (centred by negative margins, not a transform: see handleClass).
 */
function placeStyles({ side, fraction }: PortPlace): { handle: CSSProperties; sign: CSSProperties } {
  const along = `${fraction * 100}%`;
  if (side === "left") return { handle: { top: along }, sign: { top: along, left: 3, marginTop: -6 } };
  if (side === "top") return { handle: { left: along }, sign: { left: along, top: 2, marginLeft: -6 } };
  return { handle: { left: along }, sign: { left: along, bottom: 2, marginLeft: -6 } };
}

/** A summing junction: a circle with one input per sign, each sign drawn beside its port and flipped by a click. */
export const SumNode = blockMemo(function SumNode({ id, data, selected }: NodeProps<NodeOf<"sum">>) {
  const { act, readOnly } = useEditorActions();
  const { signs } = data.block;
  const size = sumDiameter(signs.length);
  const places = sumPortPlaces(signs.length);
  const stroke = strokeColor(selected, data.highlighted, data.problem);
  const far = useFarView();
  return (
    <div className="relative" style={{ width: size, height: size }}>
      <Caption block={data.block} />
      <div
        className="absolute inset-0 rounded-full border-2"
        style={{
          borderColor: stroke,
          borderStyle: data.problem === "error" && !selected && !data.highlighted ? "dashed" : "solid",
          background: data.highlighted ? "#f8ecd6" : "#fcfbf8",
          boxShadow: selected || data.highlighted ? `0 0 0 3px ${data.highlighted ? "rgba(212,137,28,0.35)" : "rgba(29,92,99,0.25)"}` : undefined,
        }}
      />
      {/* A faint cross marks the junction without naming any particular drawing convention (too faint to see far out). */}
      {!far && (
        <svg aria-hidden className="absolute inset-0 size-full" viewBox="0 0 10 10">
          <path d="M3.4 5 H6.6 M5 3.4 V6.6" stroke="#b9b2a3" strokeWidth="0.5" strokeLinecap="round" />
        </svg>
      )}
      {places.map((place, port) => {
        const styles = placeStyles(place);
        const sign = signs[port];
        const shown = sign === "+" ? "+" : "−";
        const name = `Sign of port ${port} of ${id}: ${sign === "+" ? "plus" : "minus"}`;
        return (
          <Fragment key={port}>
            <Handle type="target" id={inHandle(port)} position={POSITION[place.side]} className={handleClass} style={styles.handle} />
            {readOnly ? (
              <span aria-label={name} className="absolute flex size-3 items-center justify-center font-mono text-xs leading-none font-semibold" style={styles.sign}>
                {shown}
              </span>
            ) : (
              <button
                type="button"
                aria-label={`${name}. Flip it`}
                title="Flip this sign"
                onClick={() => act("Flip sign", (d) => toggleSign(d, id, port))}
                className="nodrag absolute z-10 flex size-3 items-center justify-center rounded-sm font-mono text-xs leading-none font-semibold text-ink hover:bg-signal-tint"
                style={styles.sign}
              >
                {shown}
              </button>
            )}
          </Fragment>
        );
      })}
      <OutPort style={{ top: "50%" }} />
    </div>
  );
});
