// Tests write transfers as text: read it back exactly, as the reducer would have built it.
import { DEGREE_LIMIT } from "@shared/algebra/errors";
import { ratDiv, ratFromExpr, type RatFn } from "@shared/algebra/ratfn";
import { parseExpression } from "@shared/expr/parse";

const PRINTED_TEXT_LIMITS = { exprLength: Number.POSITIVE_INFINITY, exponent: DEGREE_LIMIT };

/**
 * The exact rational function num/den written in the expression syntax (as the reducer prints transfers).
 * Throws on text that does not parse.
 * Example: parseTransfer("K*s + 2*K", "s^2 + s", ["K"]) is K(s + 2)/(s(s + 1)).
 */
export function parseTransfer(numerator: string, denominator: string, parameters: readonly string[]): RatFn {
  const read = (text: string) => {
    // Printed results are read without the limits meant for typed block expressions.
    const parsed = parseExpression(text, { allowS: true, parameters, limits: PRINTED_TEXT_LIMITS });
    if (!parsed.ok) throw new Error(`internal: cannot read "${text.slice(0, 200)}": ${parsed.message}`);
    return ratFromExpr(parsed.ast);
  };
  return ratDiv(read(numerator), read(denominator));
}

