import { zSplitFactors } from "@shared/algebra/factor";
import { ratFromExpr, ratNumerator } from "@shared/algebra/ratfn";
import { parseExpression } from "@shared/expr/parse";
const r = parseExpression("(108*K^6*a^6*tau^2 - 18*K^5*a^6*tau^2 + 3/4*K^4*a^6*tau^2 + 108*K^4*a^4*tau^2 - 18*K^3*a^4*tau^2 + 3/4*K^2*a^4*tau^2)*s^5 - (144*K^6*a^5*tau^3 - 12*K^5*a^5*tau^3 + 54*K^5*a^4*tau^4 - 9*K^4*a^4*tau^4 + 3/8*K^3*a^4*tau^4 + 54*K^5*a^4*tau + 144*K^4*a^3*tau^3 - 9/2*K^4*a^4*tau - 12*K^3*a^3*tau^3 + 54*K^3*a^2*tau - 9/2*K^2*a^2*tau)*s^4 - (18*K^5*a^6*tau^4 - 48*K^6*a^4*tau^4 - 3*K^4*a^6*tau^4 - 72*K^5*a^3*tau^5 + 1/8*K^3*a^6*tau^4 + 6*K^4*a^3*tau^5 - 36*K^5*a^3*tau^2 - 48*K^4*a^2*tau^4 - 27*K^4*a^2*tau^3 + 9/4*K^3*a^2*tau^3 - 27/4*K^4*a^2 - 36*K^3*a*tau^2 - 27/4*K^2)*s^3 + (24*K^5*a^5*tau^5 - 2*K^4*a^5*tau^5 - 24*K^5*a^2*tau^6 + 9*K^4*a^4*tau^3 - 3/4*K^3*a^4*tau^3 - 18*K^4*a*tau^4 - 27/8*K^3*tau^2)*s^2 - (8*K^5*a^4*tau^6 + 6*K^4*a^3*tau^4 + 9/8*K^3*a^2*tau^2)*s", { allowS: true, parameters: ["K", "a", "tau"] });
if (!r.ok) throw new Error(r.message);
const p = ratNumerator(ratFromExpr(r.ast));
const t0 = performance.now();
zSplitFactors(p.z);
console.log("ms", performance.now() - t0);
