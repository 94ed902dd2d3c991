
/** Id prefixes a control engineer reads at a glance: r reference, e error junction, G plant/controller, y output. */
/** The smallest `prefix<n>` (n ≥ 1) not in `taken`; the new id is added to `taken`. */
export function freshId(prefix: string, taken: Set<string>): string {
  return idSource(taken)(prefix);
}

/**
 * Hands out fresh ids one after another, each the smallest `prefix<n>` not in `taken` (which it extends), as
 * `freshId` would. It resumes each prefix where the last search stopped: `taken` only grows, so nothing below is
 * free again, and giving ids to n wires costs O(n) rather than O(n²).
 */
export function idSource(taken: Set<string>): (prefix: string) => string {
  const next = new Map<string, number>();
  return (prefix) => {
    let n = next.get(prefix) ?? 1;
    while (taken.has(`${prefix}${n}`)) n += 1;
    const id = `${prefix}${n}`;
    taken.add(id);
    next.set(prefix, n + 1);
    return id;
  };
}

export const blockIds = (doc: { blocks: { id: string }[] }) => new Set(doc.blocks.map((b) => b.id));
export const wireIds = (doc: { wires: { id?: string }[] }) =>
  new Set(doc.wires.flatMap((w) => (w.id === undefined ? [] : [w.id])));
