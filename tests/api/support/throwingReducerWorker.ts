import { serveChecks } from "@server/features/versions/serveChecks";

// The real check worker's loop around a reducer with a slip in it: it reads a block that is not there,
// the kind of plain exception a reducer bug throws (not a reported Problem).
serveChecks((document) => {
  const pivot = document.blocks.find((b) => b.id === "no-such-block") as { id: string };
  return { ok: false, problems: [{ severity: "error", code: "singular-pivot", blockId: pivot.id, message: "Singular pivot." }] };
});
