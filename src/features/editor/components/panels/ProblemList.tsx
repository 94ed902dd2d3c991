import type { Problem } from "@shared/diagram/problems";

/** Validation and reduction problems, errors first; a problem about a block or wire selects it when clicked. */
export function ProblemList({ problems, onPick }: { problems: Problem[]; onPick: (p: Problem) => void }) {
  if (problems.length === 0) return <p className="text-sm text-steady">No problems found.</p>;
  const sorted = [...problems].sort((a, b) => (a.severity === b.severity ? 0 : a.severity === "error" ? -1 : 1));
  return (
    <ul className="flex max-h-96 flex-col gap-1.5 overflow-y-auto" aria-label="Problems">
      {sorted.map((p, i) => {
        const mark = p.severity === "error" ? "border-fault bg-fault-tint" : "border-trace bg-trace-tint";
        const body = (
          <>
            <span className={`mr-1.5 text-[10px] font-semibold tracking-wide uppercase ${p.severity === "error" ? "text-fault" : "text-ink-soft"}`}>
              {p.severity}
            </span>
            {p.message}
          </>
        );
        return (
          <li key={`${p.code}-${i}`} className={`rounded border-l-4 ${mark} text-sm`}>
            {p.blockId || p.wireId ? (
              <button type="button" onClick={() => onPick(p)} className="w-full px-2.5 py-1.5 text-left hover:underline" title="Select it on the canvas">
                {body}
              </button>
            ) : (
              <p className="px-2.5 py-1.5">{body}</p>
            )}
          </li>
        );
      })}
    </ul>
  );
}
