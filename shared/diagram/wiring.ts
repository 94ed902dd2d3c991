import type { Problem } from "@shared/diagram/problems";
import { LIMITS, wireLabel, type Block, type DiagramDocument } from "@shared/diagram/schema";
import { namedBlock } from "@shared/diagram/blockKinds";
import { capital } from "@shared/text/words";
import { blocksById, incomingWiresByPort, inputPortCount, type WireRef } from "@shared/diagram/graph";

/** How a sentence names a wire: `wire "w1"` or `wire #2 (e → c)`. Example: wireName(ref) → 'wire "w1"'. */
export const wireName = (ref: WireRef): string => (ref.wire.id !== undefined ? `wire "${ref.wire.id}"` : ref.label);

const error = (code: string, message: string, at: Partial<Problem> = {}): Problem => ({
  severity: "error",
  code,
  message,
  ...at,
});

/** Duplicate ids and block counts. Example: two blocks "c" → one "duplicate-block-id" naming "c". */
export function identityProblems(doc: DiagramDocument): Problem[] {
  const problems: Problem[] = [];
  const firstBlock = new Map<string, number>();
  doc.blocks.forEach((block, i) => {
    const first = firstBlock.get(block.id);
    if (first === undefined) firstBlock.set(block.id, i);
    else {
      const message = `Block id "${block.id}" is used by blocks[${first}] and blocks[${i}]; block ids must be unique`;
      problems.push(error("duplicate-block-id", message, { blockId: block.id, field: "id" }));
    }
  });
  const firstWire = new Map<string, number>();
  doc.wires.forEach((wire, i) => {
    if (wire.id === undefined) return;
    const first = firstWire.get(wire.id);
    if (first === undefined) firstWire.set(wire.id, i);
    else {
      const message = `Wire id "${wire.id}" is used by wires[${first}] and wires[${i}]; wire ids must be unique`;
      problems.push(error("duplicate-wire-id", message, { wireId: wire.id, field: "id" }));
    }
  });
  const has = (type: Block["type"]) => doc.blocks.some((b) => b.type === type);
  if (!has("input")) problems.push(error("no-input-block", "The diagram has no input block: add one for the reference or disturbance signal"));
  if (!has("output")) problems.push(error("no-output-block", "The diagram has no output block: add one for the signal you want to observe"));
  if (doc.blocks.length > LIMITS.blocks) {
    const message = `The diagram has ${doc.blocks.length} blocks; the limit is ${LIMITS.blocks}`;
    problems.push(error("too-many-blocks", message));
  }
  return problems;
}

/** Each wire on its own: existing ends, direction, `port` rules. Example: a wire into a sum without port → "port-missing". */
export function wireProblems(doc: DiagramDocument): Problem[] {
  const blocks = blocksById(doc);
  const problems: Problem[] = [];
  doc.wires.forEach((wire, index) => {
    const ref: WireRef = { wire, index, label: wireLabel(wire, index) };
    const at = { wireId: ref.label };
    const [from, to] = [blocks.get(wire.from), blocks.get(wire.to)];
    if (!from) problems.push(error("wire-from-missing-block", `${capital(wireName(ref))} starts at block "${wire.from}", which does not exist`, { ...at, field: "from" }));
    if (!to) problems.push(error("wire-to-missing-block", `${capital(wireName(ref))} ends at block "${wire.to}", which does not exist`, { ...at, field: "to" }));
    if (from?.type === "output") {
      const message = `Output block "${from.id}" has an outgoing ${wireName(ref)}; an output only receives a signal`;
      problems.push(error("output-has-outgoing-wire", message, { ...at, blockId: from.id }));
    }
    if (!to) return;
    if (to.type === "input") {
      const message = `Input block "${to.id}" has an incoming ${wireName(ref)}; an input is an external signal and takes no wire`;
      problems.push(error("input-has-incoming-wire", message, { ...at, blockId: to.id }));
    } else if (to.type === "sum") {
      const ports = to.signs.length;
      if (wire.port === undefined) {
        const message = `${capital(wireName(ref))} enters summing junction "${to.id}" without a port: set port to 0…${ports - 1}`;
        problems.push(error("port-missing", message, { ...at, blockId: to.id, field: "port" }));
      } else if (wire.port >= ports) {
        const message = `${capital(wireName(ref))} enters port ${wire.port} of summing junction "${to.id}", which has only ports 0…${ports - 1} (one per sign)`;
        problems.push(error("port-out-of-range", message, { ...at, blockId: to.id, field: "port" }));
      }
    } else if (wire.port !== undefined) {
      const message = `${capital(wireName(ref))} sets port ${wire.port} on ${namedBlock(to)}; only wires into a summing junction have a port — remove it`;
      problems.push(error("port-on-non-sum", message, { ...at, blockId: to.id, field: "port" }));
    }
  });
  return problems;
}

/** Every input port wired exactly once. Example: sum "e" with port 1 empty → "unwired-port" on "e", field "signs[1]". */
export function portProblems(doc: DiagramDocument): Problem[] {
  const blocks = blocksById(doc);
  const problems: Problem[] = [];
  for (const [id, ports] of incomingWiresByPort(doc)) {
    const block = blocks.get(id) as Block;
    ports.forEach((wires, port) => {
      const field = block.type === "sum" ? `signs[${port}]` : undefined;
      if (wires.length === 0) {
        const message =
          block.type === "sum"
            ? `Summing junction "${id}" has nothing wired into port ${port} (sign ${block.signs[port]}): connect a wire with port ${port} or remove the sign`
            : `${capital(namedBlock(block))} has no incoming wire: connect its input`;
        problems.push(error("unwired-port", message, { blockId: id, ...(field ? { field } : {}) }));
      }
      for (const extra of wires.slice(1)) problems.push(extraWire(block, port, wires[0], extra));
    });
  }
  return problems;
}

function extraWire(block: Block, port: number, first: WireRef, extra: WireRef): Problem {
  const at = { blockId: block.id, wireId: extra.label, related: [first.label] };
  if (block.type === "sum") {
    const message = `${capital(wireName(extra))} enters port ${port} of summing junction "${block.id}", which ${wireName(first)} already feeds; add a sign for it`;
    return error("port-occupied", message, { ...at, field: "port" });
  }
  const message =
    `${capital(wireName(extra))} is a second wire into ${namedBlock(block)} (already fed by ${wireName(first)}); ` +
    `a block has ${inputPortCount(block)} input — add a summing junction to combine signals`;
  return error("second-incoming-wire", message, at);
}
