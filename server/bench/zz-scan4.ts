import fc from "fast-check";
import { complexPoint, paramPoint, wellPosedDiagram } from "tests/support/arbitraries";
import { blockSolve } from "tests/support/blockSolve";
import { mason } from "tests/support/mason";
import { cClose, cText, cDiv, cMul, cx, cAbs } from "tests/support/complex";
import { evalExpr } from "tests/support/evalExpr";
import { evalTransfer, reduceOurs } from "tests/support/ours";
const maxCore = Number(process.argv[2]);
const samples = fc.sample(fc.tuple(wellPosedDiagram({ maxCore }), fc.array(complexPoint, { minLength: 3, maxLength: 3 }), paramPoint), { numRuns: Number(process.argv[3]), seed: Number(process.argv[4]) });
let fails = 0;
samples.forEach(([g, pts, params], i) => {
  const t0 = performance.now();
  let ours;
  try { ours = reduceOurs(g.doc); } catch (e) { console.log(i, "REFUSED", (e as Error).message.slice(0, 400)); fails++; return; }
  const t1 = performance.now();
  const s = pts[0];
  for (const ref of [blockSolve(g.doc, s, params), ...(maxCore <= 9 ? [mason(g.doc, s, params)] : [])]) {
    for (const r of ref.transfers) {
      const t = ours.transfers.find((x) => x.input === r.input && x.output === r.output);
      if (!t) { console.log(i, "missing pair", r.input, r.output); fails++; continue; }
      const mine = evalTransfer(t, s, { ...params, K: params.K * (1 + 1e-6) });
      if (!cClose(mine, r.value, 1e-8, 1e-12)) { fails++; console.log(i, "MISMATCH", r.input, r.output, cText(mine), cText(r.value), t.numerator.slice(0,80), "/", t.denominator.slice(0,80)); }
    }
  }
  const chi = ours.characteristic;
  const ratios = pts.map((p) => {
    const dens = Object.values(g.denominators).reduce((acc, d) => cMul(acc, evalExpr(d, p, params)), cx(1));
    return cDiv(evalExpr(chi, p, params), cMul(blockSolve(g.doc, p, params).det, dens));
  });
  for (const r of ratios.slice(1)) if (!cClose(r, ratios[0], 1e-7) || cAbs(ratios[0]) === 0) { fails++; console.log(i, "CHI", cText(r), cText(ratios[0]), chi.slice(0, 100)); break; }
  const t2 = performance.now();
  if (t2 - t0 > 300) console.log(i, "slow", (t1 - t0).toFixed(0), (t2 - t1).toFixed(0));
});
console.log("fails", fails);
