/** Greek letter names engineers type, with the letter each stands for. */
export const GREEK: Readonly<Record<string, string>> = {
  alpha: "α", beta: "β", gamma: "γ", delta: "δ", epsilon: "ε", zeta: "ζ", eta: "η", theta: "θ", iota: "ι", kappa: "κ",
  lambda: "λ", mu: "μ", nu: "ν", xi: "ξ", pi: "π", rho: "ρ", sigma: "σ", tau: "τ", upsilon: "υ", phi: "φ", chi: "χ",
  psi: "ψ", omega: "ω", Gamma: "Γ", Delta: "Δ", Theta: "Θ", Lambda: "Λ", Xi: "Ξ", Pi: "Π", Sigma: "Σ", Upsilon: "Υ",
  Phi: "Φ", Psi: "Ψ", Omega: "Ω",
};
export const isGreek = (name: string) => Object.hasOwn(GREEK, name);

/** A name's base and subscript: `K_p` → ["K", "p"], `Kp` → ["Kp", ""]. */
const baseAndSub = (name: string): [string, string] => {
  const cut = name.indexOf("_");
  return cut > 0 ? [name.slice(0, cut), name.slice(cut + 1)] : [name, ""];
};

/**
 * A parameter name as engineers write it: `tau` → τ, `K_p` → K with subscript p, `Kp` italic as one symbol.
 * Example: nameLatex("omega_n") === "\\omega_{n}".
 */
export function nameLatex(name: string): string {
  const [base, sub] = baseAndSub(name);
  const head = isGreek(base) ? `\\${base}` : base.length > 1 ? `\\mathit{${base}}` : base;
  return sub ? `${head}_{${sub.replaceAll("_", "\\_")}}` : head;
}

/**
 * Whether a name prints as several letters in a row (`Kp`, `Ti`), which run into their neighbours in a product
 * unless a dot stands between; one letter, a Greek letter or either with a subscript (`K_p`, `ω_n`) does not.
 * Example: readsAsWord("Kpos") === true, readsAsWord("K_p") === false.
 */
export function readsAsWord(name: string): boolean {
  const [base] = baseAndSub(name);
  return base.length > 1 && !isGreek(base);
}
