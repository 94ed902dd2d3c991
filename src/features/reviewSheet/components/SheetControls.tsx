import { useId, type ReactNode } from "react";
import { Printer } from "lucide-react";
import { Button } from "@/components/Button";
import { PAPERS, type Paper } from "@/features/reviewSheet/lib/paper";

/** The sheet's screen-only controls: the paper it prints on, and Print (the browser's print dialog). */
export function SheetControls({ paper, onPaper, backLink }: { paper: Paper; onPaper: (paper: Paper) => void; backLink: ReactNode }) {
  const selectId = useId();
  return (
    <div role="group" aria-label="Sheet controls" className="flex w-full flex-wrap items-center gap-3 text-sm print:hidden">
      {backLink}
      <span className="ml-auto flex items-center gap-2">
        <label htmlFor={selectId} className="text-ink-soft">
          Paper
        </label>
        <select id={selectId} value={paper} onChange={(e) => onPaper(e.target.value as Paper)} className="rounded border border-rule-strong bg-paper-raised px-2 py-1">
          {PAPERS.map((p) => (
            <option key={p} value={p}>
              {p}
            </option>
          ))}
        </select>
      </span>
      <Button variant="primary" size="sm" onClick={() => window.print()}>
        <Printer className="size-4" aria-hidden /> Print
      </Button>
    </div>
  );
}
