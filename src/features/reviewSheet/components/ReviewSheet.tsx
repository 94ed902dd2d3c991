import type { ReactNode } from "react";
import { ProblemAlert } from "@/components/ProblemAlert";
import { SafetyNote } from "@/components/SafetyNote";
import { PrintStyle } from "@/features/reviewSheet/components/PrintStyle";
import { SheetControls } from "@/features/reviewSheet/components/SheetControls";
import { usePaper } from "@/features/reviewSheet/hooks/usePaper";
import { sheetBox } from "@/features/reviewSheet/lib/paper";
import { formatDateTime } from "@/lib/format";
import { useDocumentTitle } from "@/lib/useDocumentTitle";

/** What the sheet's heading says about the version. */
export interface SheetVersion {
  title: string;
  teamName: string;
  number: number;
  message: string;
  author: string;
  savedAt: string;
}

interface Props {
  version: SheetVersion;
  /** The server's drawing of the version (its export.svg). */
  figureSrc: string;
  /** The problems the version was saved with; shown instead of the analysis. */
  problems: string[] | null;
  /** The closed loop, metrics and plots of the version (drawn by the editor's analysis). */
  analysis: ReactNode;
  backLink: ReactNode;
}

/**
 * One saved version on one printable page: heading, figure, analysis (or the problems it was saved with) and the
 * safety caution. The page is a box of the paper's printable area, the same on screen as in print; the figure takes
 * whatever height the rest leaves and the analysis is cut rather than spilling, so the sheet never runs to a second page.
 */
export function ReviewSheet({ version: v, figureSrc, problems, analysis, backLink }: Props) {
  const [paper, setPaper] = usePaper();
  useDocumentTitle(`${v.title} v${v.number}: review sheet`);
  const label = `${v.title}, version ${v.number}`;
  return (
    <div className="flex flex-col items-center gap-4">
      <PrintStyle paper={paper} />
      <SheetControls paper={paper} onPaper={setPaper} backLink={backLink} />
      {/* On screen the paper with its margins (PAGE_MARGIN_MM); in print the printer's margins come from @page. */}
      <div className="max-w-full overflow-x-auto bg-white p-[12mm] shadow-md ring-1 ring-rule print:overflow-visible print:p-0 print:shadow-none print:ring-0">
        <article aria-label={`Review sheet of ${label}`} style={sheetBox(paper)} className="flex flex-col gap-3 overflow-hidden text-ink">
          <div className="flex shrink-0 flex-wrap items-end justify-between gap-x-6 gap-y-1 border-b border-rule-strong pb-2">
            <div className="min-w-0">
              <p className="text-xs font-medium tracking-wide text-ink-faint uppercase">Review sheet · {v.teamName}</p>
              <h1 className="text-xl font-semibold tracking-tight">{v.title}</h1>
            </div>
            <dl aria-label="Version details" className="grid grid-cols-[auto_auto] gap-x-3 text-xs">
              <dt className="text-ink-soft">Version</dt>
              <dd className="font-medium">v{v.number}</dd>
              <dt className="text-ink-soft">Author</dt>
              <dd>{v.author || "unknown"}</dd>
              <dt className="text-ink-soft">Saved</dt>
              <dd>{formatDateTime(v.savedAt)}</dd>
            </dl>
            <p className="w-full text-sm">
              <span className="text-ink-soft">Message: </span>
              {v.message || <span className="text-ink-faint">no message</span>}
            </p>
          </div>
          <img src={figureSrc} alt={`Block diagram of ${label}`} className="max-h-[95mm] min-h-[35mm] w-full flex-1 object-contain" />
          <div className="min-h-0 shrink overflow-hidden">
            {problems ? <ProblemAlert title={`Version ${v.number} was saved with problems, so it has no analysis.`} problems={problems} /> : analysis}
          </div>
          <div className="mt-auto shrink-0 border-t border-rule pt-2">
            <SafetyNote />
          </div>
        </article>
      </div>
    </div>
  );
}
