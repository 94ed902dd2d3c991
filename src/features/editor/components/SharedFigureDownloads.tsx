import { Download } from "lucide-react";
import { sharedFigureHref, type FigureFormat } from "@/features/editor/api/versionExport";

const FIGURES: { format: FigureFormat; label: string }[] = [
  { format: "svg", label: "Download figure (SVG)" },
  { format: "png", label: "Download figure (PNG, 2×)" },
];

/** The shared version's figure as files, drawn by the server from the version the token opens (no review comments). */
export function SharedFigureDownloads({ token }: { token: string }) {
  return (
    <nav aria-label="Downloads" className="flex flex-wrap items-center gap-2">
      {FIGURES.map(({ format, label }) => (
        <a
          key={format}
          href={sharedFigureHref(token, format)}
          download
          className="inline-flex items-center gap-1.5 rounded border border-rule bg-paper-raised px-3 py-1.5 text-sm text-ink hover:bg-paper-sunk focus-visible:outline-2 focus-visible:outline-signal"
        >
          <Download className="size-4" aria-hidden />
          {label}
        </a>
      ))}
    </nav>
  );
}
