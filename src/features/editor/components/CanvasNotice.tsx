import { useEffect, useRef, useState } from "react";
import type { Point } from "@/features/editor/commands/types";

export interface Notice {
  message: string;
  /** Client coordinates to show it at (the pointer); null anchors it to the top of the canvas. */
  at: Point | null;
  key: number;
}

const SHOW_MS = 6000;

/** Why an edit was refused, shown where the user is looking; read out by screen readers as an alert. */
export function CanvasNotice({ notice, onDone }: { notice: Notice | null; onDone: () => void }) {
  const box = useRef<HTMLDivElement>(null);
  const [origin, setOrigin] = useState<Point>({ x: 0, y: 0 });
  useEffect(() => {
    if (!notice) return;
    const rect = box.current?.parentElement?.getBoundingClientRect();
    if (rect) setOrigin({ x: rect.left, y: rect.top });
    const t = window.setTimeout(onDone, SHOW_MS);
    return () => window.clearTimeout(t);
  }, [notice, onDone]);
  const style = notice?.at
    ? { left: Math.max(8, notice.at.x - origin.x + 14), top: Math.max(8, notice.at.y - origin.y + 14) }
    : { left: "50%", top: 12, transform: "translateX(-50%)" };
  return (
    <div ref={box} role="alert" className="pointer-events-none absolute z-20 max-w-sm" style={notice ? style : undefined}>
      {notice && (
        <p key={notice.key} className="pointer-events-auto rounded border border-fault bg-paper-raised px-3 py-2 text-sm text-ink shadow-md">
          <strong className="mr-1 font-semibold text-fault">Not allowed:</strong>
          {notice.message}
        </p>
      )}
    </div>
  );
}
