import { useEffect, useId, useRef, type ReactNode } from "react";
import { X } from "lucide-react";

interface Props {
  title: string;
  onClose: () => void;
  children: ReactNode;
  /** Wider dialogs for tables (the shortcut list). */
  wide?: boolean;
  /** Nearly the whole window, scrolling inside (a comparison of two diagrams). */
  full?: boolean;
}

/** A modal on the native <dialog>: focus stays inside, Esc closes, the page behind is inert. */
export function Dialog({ title, onClose, children, wide = false, full = false }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (d && !d.open) d.showModal();
    return () => d?.close();
  }, []);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className={`m-auto w-[calc(100%-2rem)] ${full ? "max-h-[92vh] max-w-7xl overflow-y-auto" : wide ? "max-w-2xl" : "max-w-md"} rounded-md border border-rule bg-paper-raised p-0 text-ink shadow-lg backdrop:bg-ink/30`}
    >
      <div className="flex items-center justify-between border-b border-rule px-5 py-3">
        <h2 id={titleId} className="text-base font-semibold">
          {title}
        </h2>
        <button type="button" aria-label="Close" onClick={onClose} className="rounded p-1 text-ink-soft hover:bg-paper-sunk">
          <X className="size-4" />
        </button>
      </div>
      <div className="px-5 py-4">{children}</div>
    </dialog>
  );
}
