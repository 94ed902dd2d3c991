import { useEffect, useId, useRef, useState, type KeyboardEvent } from "react";
import { ChevronDown, Download } from "lucide-react";
import type { VersionExports } from "@/features/editor/api/versionExport";

/**
 * The toolbar's Export menu button: the open saved version's figure (SVG, PNG at 2×) and document (.json) as
 * downloads, and its printable review sheet (a page). A menu button in the usual keyboard pattern: Enter, Space or
 * ArrowDown open it on the first item, arrows, Home and End move, Escape closes it and gives focus back to the
 * button. Before the first save it is disabled and says why.
 */
export function ExportMenu({ exports, className }: { exports: VersionExports | null; className: string }) {
  const [open, setOpen] = useState(false);
  const menuId = useId();
  const button = useRef<HTMLButtonElement>(null);
  const items = useRef<(HTMLAnchorElement | null)[]>([]);
  const entries = exports
    ? [
        { label: "Figure (SVG)", href: exports.svg, download: true },
        { label: "Figure (PNG, 2×)", href: exports.png, download: true },
        { label: "Figure with open comments (SVG)", href: exports.svgWithComments, download: true },
        { label: "Document (.json)", href: exports.json, download: true },
        { label: "Review sheet", href: exports.sheet, download: false },
      ]
    : [];

  useEffect(() => {
    if (open) items.current[0]?.focus();
  }, [open]);

  const close = (focusButton: boolean) => {
    setOpen(false);
    if (focusButton) button.current?.focus();
  };

  const onMenuKey = (e: KeyboardEvent) => {
    const at = items.current.findIndex((el) => el === document.activeElement);
    const n = entries.length;
    const next = { ArrowDown: at + 1, ArrowUp: at - 1, Home: 0, End: n - 1 }[e.key];
    if (e.key === "Escape") {
      e.preventDefault();
      return close(true);
    }
    if (e.key === "Tab") return close(false);
    if (next === undefined) return;
    e.preventDefault();
    items.current[(next + n) % n]?.focus();
  };

  return (
    <div
      className="relative"
      onBlur={(e) => {
        if (!e.currentTarget.contains(e.relatedTarget as Node | null)) setOpen(false);
      }}
    >
      <button
        ref={button}
        type="button"
        className={className}
        aria-haspopup="menu"
        aria-expanded={open}
        aria-controls={open ? menuId : undefined}
        disabled={!exports}
        title={exports ? `Download version ${exports.number} (as saved)` : "Save a version first: exports are made from a saved version"}
        onClick={() => setOpen((o) => !o)}
        onKeyDown={(e) => {
          if (e.key === "ArrowDown" && exports) {
            e.preventDefault();
            setOpen(true);
          }
        }}
      >
        <Download className="size-4" aria-hidden /> Export <ChevronDown className="size-3.5" aria-hidden />
      </button>
      {open && exports && (
        <div
          id={menuId}
          role="menu"
          aria-label={`Export version ${exports.number}`}
          onKeyDown={onMenuKey}
          className="absolute left-0 z-20 mt-1 flex min-w-48 flex-col rounded border border-rule bg-paper-raised py-1 shadow-md"
        >
          {entries.map((entry, i) => (
            <a
              key={entry.label}
              ref={(el) => {
                items.current[i] = el;
              }}
              role="menuitem"
              tabIndex={-1}
              href={entry.href}
              download={entry.download || undefined}
              onClick={() => close(true)}
              className="px-3 py-1.5 text-sm text-ink hover:bg-paper-sunk focus:bg-paper-sunk focus:outline-none"
            >
              {entry.label}
            </a>
          ))}
        </div>
      )}
    </div>
  );
}
