import { useId, useRef, useState, type KeyboardEvent, type ReactNode } from "react";

export interface TabSpec {
  key: string;
  label: string;
  /** Rendered only while the tab is open: hidden tabs cost nothing on a slider move. */
  render: () => ReactNode;
}

/** A tab list with arrow-key, Home and End navigation (automatic activation); one panel shown at a time. */
export function AnalysisTabs({ label, tabs, onOpen }: { label: string; tabs: TabSpec[]; onOpen?: (key: string) => void }) {
  const base = useId();
  const [open, setOpenState] = useState(tabs[0]?.key ?? "");
  const setOpen = (key: string) => {
    setOpenState(key);
    onOpen?.(key);
  };
  const buttons = useRef<(HTMLButtonElement | null)[]>([]);
  const at = Math.max(0, tabs.findIndex((t) => t.key === open));

  const onKey = (e: KeyboardEvent) => {
    const next = { ArrowRight: at + 1, ArrowLeft: at - 1, Home: 0, End: tabs.length - 1 }[e.key];
    if (next === undefined) return;
    e.preventDefault();
    const i = (next + tabs.length) % tabs.length;
    setOpen(tabs[i].key);
    buttons.current[i]?.focus();
  };

  return (
    <div className="flex flex-col gap-3">
      <div role="tablist" aria-label={label} onKeyDown={onKey} className="flex flex-wrap gap-1 border-b border-rule">
        {tabs.map((t, i) => (
          <button
            key={t.key}
            ref={(el) => {
              buttons.current[i] = el;
            }}
            type="button"
            role="tab"
            id={`${base}-tab-${t.key}`}
            aria-selected={i === at}
            aria-controls={`${base}-panel-${t.key}`}
            tabIndex={i === at ? 0 : -1}
            onClick={() => setOpen(t.key)}
            className={`-mb-px rounded-t border px-3 py-1.5 text-sm ${i === at ? "border-rule border-b-paper-raised bg-paper-raised font-medium text-ink" : "border-transparent text-ink-soft hover:text-ink"}`}
          >
            {t.label}
          </button>
        ))}
      </div>
      {tabs.map((t, i) => (
        <div key={t.key} role="tabpanel" id={`${base}-panel-${t.key}`} aria-labelledby={`${base}-tab-${t.key}`} hidden={i !== at} tabIndex={0} className="min-w-0">
          {i === at && t.render()}
        </div>
      ))}
    </div>
  );
}
