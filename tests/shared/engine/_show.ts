import { reduceDocument } from "@shared/engine/reduceDocument";
import { diagram } from "../reduce/diagramSpec";
const docs = [diagram(
      [["r", "input"], ["e1", "sum", ["+", "-"]], ["g1", "gain", "K"], ["e2", "sum", ["+", "-"]],
        ["g2", "transfer", "1/(s+1)"], ["h2", "gain", "2"], ["g3", "integrator"], ["y", "output"]],
      ["r>e1:0", "e1>g1", "g1>e2:0", "e2>g2", "g2>h2", "h2>e2:1", "g2>g3", "g3>y", "g3>e1:1"], { K: 3 }),
  diagram(
      [["r", "input"], ["e", "sum", ["+", "-"]], ["p", "branch"], ["a", "transfer", "1/(s+1)"], ["b", "transfer", "2/(s+3)"],
        ["j", "sum", ["+", "+"]], ["h", "gain", "k"], ["y", "output"]],
      ["r>e:0", "e>p", "p>a", "p>b", "a>j:0", "b>j:1", "j>y", "j>h", "h>e:1"], { k: 2 })];
for (const doc of docs) { const out = reduceDocument(doc); if (out.ok) { for (const s of out.result.steps) console.log(s.rule, "|", s.description, "|", s.expr, "|", s.consumedBlocks.join(","), "|", s.consumedWires.join(",")); console.log(out.result.transfers[0].numerator, "/", out.result.transfers[0].denominator); } }
