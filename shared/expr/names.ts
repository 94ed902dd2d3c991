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
  if (isDelaySymbol(name)) return name.slice(name.indexOf(DELAY_MARK) + 1);
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
  if (isDelaySymbol(name)) return false;
  const [base] = baseAndSub(name);
  return base.length > 1 && !isGreek(base);
}

// A dead time e^(−sT) is not a rational function of s: the exact algebra carries it as a symbol of its own whose
// name holds both its printed forms, so every printer shows it without a side table and no user name can clash.
const DELAY_MARK = "\u241E";

/**
 * The symbol standing for e^(−sT), from T's expression text and LaTeX (T has no s).
 * Example: nameText(delaySymbol("1/2", "\\frac{1}{2}")) === "exp(-1/2*s)".
 */
export function delaySymbol(tText: string, tLatex: string): string {
  const simple = /^[\w.]+$/.test(tText) || /^\d+\/\d+$/.test(tText);
  const latexSimple = /^[\w\\{}]+$/.test(tLatex) || tLatex.startsWith("\\frac");
  return `exp(-${simple ? tText : `(${tText})`}*s)${DELAY_MARK}e^{-${latexSimple ? tLatex : `\\left(${tLatex}\\right)`}\\,s}`;
}

/** Whether a variable of the algebra is a dead-time symbol. Example: isDelaySymbol("K") === false. */
export const isDelaySymbol = (name: string): boolean => name.includes(DELAY_MARK);

/** A variable as expression syntax: its name, or a dead time's exp(−T*s). Example: nameText("K") === "K". */
export const nameText = (name: string): string => (isDelaySymbol(name) ? name.slice(0, name.indexOf(DELAY_MARK)) : name);
