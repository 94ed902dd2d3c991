import { useId, type ReactNode } from "react";
import { ERROR_CONSTANTS } from "@shared/analysis/steadyState";
import { Tex } from "@/features/editor/components/Tex";

/** One defined term: its name and what the analysis means by it. */
const TERMS: { term: string; body: ReactNode }[] = [
  {
    term: "Which transfer function",
    body: (
      <>
        Poles, zeros and the stability verdict belong to the chosen pair&apos;s transfer function T(s) in lowest terms: common factors
        of numerator and denominator are cancelled first. A mode cancelled during the reduction is listed as a hidden mode, not as a
        pole; an unstable hidden mode makes the loop internally unstable even when T(s) looks stable. Without a choice, the pair is the
        first input block and the first output block in the order the document lists its blocks.
      </>
    ),
  },
  {
    term: "Stable, marginal, unstable",
    body: (
      <>
        Decided exactly on the rational coefficients, not with a rounding tolerance. Stable: every pole has a negative real part.
        Marginal: the poles on the imaginary axis (s = 0 included) are all simple and none lies to the right of it. Unstable: a pole
        in the right half-plane, or a repeated pole on the imaginary axis.
      </>
    ),
  },
  {
    term: "DC gain",
    body: <>T(0), whenever s = 0 is not a pole, unstable systems included; otherwise there is none.</>,
  },
  {
    term: "Step metrics",
    body: (
      <>
        Taken on the unit step response y(t), and only for a stable, proper T(s) with T(0) ≠ 0 (otherwise the panel says which of
        these fails). With a negative final value they are read on y(t)/T(0). Final value: T(0). Rise time: from the first time the
        response reaches 10 % of the final value to the first time it reaches 90 %. Peak time: the first time y(t)/T(0) reaches its
        global maximum; without overshoot there is none. Overshoot: how far that maximum exceeds 1, in percent; 0 when it never does.
        Settling time: the last time the response leaves the band of ±2 % around the final value (1 % and 5 % can be chosen).
      </>
    ),
  },
  {
    term: "Loop gain at a break",
    body: (
      <>
        Cut the chosen wire, inject a signal u at its destination side (through that port&apos;s sign), read w at its source side, and
        keep every other loop closed: <Tex latex="L(s) = -w/u" />. Unity negative feedback around G gives L = G. By default the break
        is the wire into the minus-signed port of the first summing junction the chosen input reaches; when there is none, the panel
        shows no margins and asks for a wire to break.
      </>
    ),
  },
  {
    term: "Crossovers and margins",
    body: (
      <>
        Crossovers are at finite ω &gt; 0, in rad/s. At a gain crossover |L(jω)| = 1; the phase margin there is 180° + ∠L(jω), brought
        into (−180°, 180°]. At a phase crossover L(jω) is real and negative; the gain margin there is −20 log₁₀|L(jω)| dB. With several
        crossovers, the one with the smallest |margin| is reported; with none, that margin is infinite. Margins are reported, negative
        if need be, even when the closed loop is unstable.
      </>
    ),
  },
  {
    term: "Delay margin, sensitivity peak, bandwidth",
    body: (
      <>
        Delay margin: the smallest extra delay in the loop that turns a gain crossover to −180°, the phase margin (taken in [0°, 360°),
        in radians) divided by that crossover&apos;s ω; defined only when the closed loop is stable. Sensitivity peak:{" "}
        <Tex latex="M_s = \max_\omega \left| 1/(1 + L(j\omega)) \right|" />, the inverse of the closest approach of the Nyquist curve to
        −1. Closed-loop bandwidth: the first ω where |T(jω)| falls to |T(0)|/√2.
      </>
    ),
  },
  {
    term: "Nyquist criterion",
    body: (
      <>
        s runs up the imaginary axis, passing to the right of any pole on it along a small half-circle, and returns along a large
        half-circle in the right half-plane. N counts the clockwise encirclements of −1 by L(s) along that path, P the poles of L in
        the right half-plane; then Z = N + P closed-loop poles lie in the right half-plane, and the loop is stable exactly when Z = 0.
        When L has poles in the right half-plane, or the loop is conditionally stable, negative margins alone do not mean instability.
      </>
    ),
  },
  {
    term: "Dead time and Padé order",
    body: (
      <>
        A dead-time block delays its input by T seconds: <Tex latex="e^{-sT}" />, not a rational function of s. The closed loop is shown
        exactly, with the exponential kept. Margins, crossovers, the delay margin, Ms, bandwidth and the Bode and Nyquist plots use the
        exact <Tex latex="e^{-j\omega T}" />, and the Nyquist criterion applied to that exact L(jω) gives the true stability of the
        delayed loop (P, the open-loop poles in the right half-plane, is unchanged by a delay in the loop). Poles, zeros, the Routh
        array, stable ranges, the root locus and the time responses need a rational function: there each e^(−sT) is replaced by its
        Padé approximant of the order shown (“Padé order N”), whose error grows with ωT — raise the order when a figure moves with it.
        The step and ramp responses are also drawn with the dead time kept exactly (“exact dead time”), with their step metrics: the
        delay differential equation of the closed loop is simulated on a fixed grid of 8,000 steps, exact between steps for the
        undelayed part and second-order accurate for the delayed terms; checked against a fine-step simulation of the block diagram
        to better than 1 part in 10⁶ of the response.
      </>
    ),
  },
  {
    term: "Routh array",
    body: (
      <>
        The number of sign changes down the first column is the number of roots in the right half-plane. A row that starts with 0 but
        is not all zero: the 0 becomes a small ε &gt; 0 and the signs are read as ε → 0⁺. A row that is all zero: the row above gives the
        auxiliary polynomial A(s), whose roots are symmetric about the origin and are roots of the polynomial too; the zero row is
        replaced by the coefficients of dA/ds.
      </>
    ),
  },
  {
    term: "Final value theorem",
    body: (
      <>
        <Tex latex="\lim_{t\to\infty} y(t) = \lim_{s\to 0} sY(s)" /> holds only when every pole of sY(s) lies in the open left
        half-plane; otherwise the panel does not apply it and says why. Steady-state errors are those of e = (pair input) − (pair
        output); system type and the position, velocity and acceleration error constants come from the loop gain at the break.
        Each is written with a word as subscript, so that none is read as a parameter of the diagram (a parameter named Kp or Kv
        is a different thing):{" "}
        {ERROR_CONSTANTS.map((c, i) => (
          <span key={c.key}>
            {i > 0 && (i === ERROR_CONSTANTS.length - 1 ? " and " : ", ")}
            the {c.name} <Tex latex={`${c.latex} = ${c.limitLatex}`} />
          </span>
        ))}
        .
      </>
    ),
  },
  {
    term: "Discretisation methods (Implementation tab)",
    body: (
      <>
        The chosen block&apos;s transfer, or the analysed pair&apos;s closed loop, at the slider values, turned into H(z) at the
        sample time Ts. <strong>Tustin</strong> (bilinear): s = (2/Ts)·(z − 1)/(z + 1), computed in exact fractions.{" "}
        <strong>Tustin with pre-warping</strong> at ω₀ (0 &lt; ω₀ &lt; π/Ts; by default the closed-loop bandwidth): s = (ω₀/tan(ω₀Ts/2))·(z
        − 1)/(z + 1), so that H matches G exactly at ω₀. <strong>Zero-order hold</strong>: the exact equivalent of G driven through a
        sample-and-hold, H(z) = (1 − z⁻¹)·Z&#123;G(s)/s&#125;, so step responses agree at the sampling instants.{" "}
        <strong>Matched pole-zero</strong>: each pole and finite zero s maps to z = e^(s·Ts), each zero at infinity to z = −1, and the
        gain matches G&apos;s low-frequency behaviour (its DC gain, or g₀·s^k near s = 0 with s ≈ (z − 1)/Ts). Improper transfers
        (more zeros than poles) have no zero-order-hold or matched equivalent and no state-space realisation; dead times are not
        implemented (model them as a Padé transfer block). The Bode overlay runs up to the Nyquist frequency π/Ts. A warning
        appears when 2π/Ts is less than 10 times the analysed pair&apos;s closed-loop bandwidth (common practice samples at 10–30 times).
        Coefficients are listed to 17 significant digits, which read back the same double-precision number.
      </>
    ),
  },
  {
    term: "State-space forms",
    body: (
      <>
        ẋ = A x + B u, y = C x + D u realising G(s) in lowest terms. <strong>Controllable canonical</strong>: the denominator&apos;s
        coefficients −a₁…−aₙ in the first row of A, ones below the diagonal, B = (1, 0, …, 0)ᵀ. <strong>Observable canonical</strong>:
        its dual (Aᵀ, Cᵀ, Bᵀ). <strong>Minimal</strong>: a realisation of the least possible order n, the degree of the denominator in
        lowest terms (every form here has that order). When the system is asymptotically stable (and of order ≤ 20) the minimal
        form shown is the <em>balanced</em> realisation, whose controllability and observability Gramians are equal and diagonal —
        the Hankel singular values, largest first; otherwise it is the controllable canonical form, and the panel says why.
      </>
    ),
  },
];

/** The definitions every figure of the analysis follows (the panel itself shows the caution about the model). */
export function AnalysisHelp() {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-2 text-sm">
      <h3 id={headingId} className="font-semibold">Definitions the analysis follows</h3>
      <dl className="flex flex-col gap-2">
        {TERMS.map((t) => (
          <div key={t.term}>
            <dt className="font-medium">{t.term}</dt>
            <dd className="text-ink-soft">{t.body}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
