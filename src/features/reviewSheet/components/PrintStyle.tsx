import { pageRule, type Paper } from "@/features/reviewSheet/lib/paper";

/**
 * The print rules of the sheet, in the page only while the sheet is open: the chosen paper in `@page`, and no
 * minimum page height (the app's screen layout asks for a full window, which in print could start a second page).
 */
export function PrintStyle({ paper }: { paper: Paper }) {
  return <style>{`${pageRule(paper)}\n@media print { html, body { min-height: 0 !important; background: #fff; } }`}</style>;
}
