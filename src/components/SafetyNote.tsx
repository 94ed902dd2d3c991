/** The caution every page carries; the wording is fixed by the product. */
export function SafetyNote() {
  return (
    <p className="text-xs leading-relaxed text-ink-soft">
      <strong className="font-semibold text-ink">Safety: </strong>
      Loopwright results describe linear models only. Validate every design on the real plant, follow your
      organisation&apos;s functional-safety process and local codes, and get licensed engineering sign-off where required.
    </p>
  );
}
