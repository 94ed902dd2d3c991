import { useId, type KeyboardEvent, type ReactNode } from "react";

export type SideTab = "properties" | "comments";

interface Props {
  tab: SideTab;
  onTab: (tab: SideTab) => void;
  properties: ReactNode;
  /** The review comments and the tab's label ("Comments (2 open)"); none where there is nothing to comment on. */
  comments?: { label: string; body: ReactNode };
}

const asideClass = "min-h-0 flex-1 overflow-y-auto p-4";

/**
 * The column beside the canvas: the selection's properties and, where the app offers them, the review comments,
 * as two tabs. Both stay mounted so the comments keep the canvas's pins current while properties are shown.
 */
export function SidePanel({ tab, onTab, properties, comments }: Props) {
  const id = useId();
  if (!comments)
    return (
      <aside aria-label="Properties" className={`${asideClass} border-l border-rule bg-paper-raised`}>
        {properties}
      </aside>
    );
  const tabs: { key: SideTab; label: string }[] = [
    { key: "properties", label: "Properties" },
    { key: "comments", label: comments.label },
  ];
  // Arrow keys move between the two tabs, as the tabs pattern expects.
  const onKey = (e: KeyboardEvent) => {
    if (e.key !== "ArrowLeft" && e.key !== "ArrowRight") return;
    e.preventDefault();
    const next = tab === "properties" ? "comments" : "properties";
    onTab(next);
    document.getElementById(`${id}-${next}-tab`)?.focus();
  };
  return (
    <div className="flex min-h-0 flex-col border-l border-rule bg-paper-raised">
      <div role="tablist" aria-label="Side panel" className="flex border-b border-rule text-sm" onKeyDown={onKey}>
        {tabs.map((t) => (
          <button
            key={t.key}
            id={`${id}-${t.key}-tab`}
            type="button"
            role="tab"
            aria-selected={tab === t.key}
            aria-controls={`${id}-${t.key}`}
            tabIndex={tab === t.key ? 0 : -1}
            onClick={() => onTab(t.key)}
            className={`flex-1 px-3 py-2 font-medium ${tab === t.key ? "border-b-2 border-signal text-ink" : "text-ink-soft hover:text-ink"}`}
          >
            {t.label}
          </button>
        ))}
      </div>
      {/* Each tab panel holds a landmark, so "Properties" and "Review comments" are found as regions too. */}
      <div id={`${id}-properties`} role="tabpanel" aria-labelledby={`${id}-properties-tab`} hidden={tab !== "properties"} className={asideClass}>
        <aside aria-label="Properties">{properties}</aside>
      </div>
      <div id={`${id}-comments`} role="tabpanel" aria-labelledby={`${id}-comments-tab`} hidden={tab !== "comments"} className={asideClass}>
        <aside aria-label="Review comments">{comments.body}</aside>
      </div>
    </div>
  );
}
