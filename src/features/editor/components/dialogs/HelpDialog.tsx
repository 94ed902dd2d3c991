import { Dialog } from "@/features/editor/components/dialogs/Dialog";
import { SHORTCUTS } from "@/features/editor/lib/shortcuts";

/** Every shortcut, read from the same table the key handler uses; viewers see only what they can use. */
export function HelpDialog({ readOnly, onClose }: { readOnly: boolean; onClose: () => void }) {
  const shown = SHORTCUTS.filter((s) => !readOnly || !s.edits);
  return (
    <Dialog title="Keyboard shortcuts" onClose={onClose} wide>
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Keyboard shortcuts</caption>
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            <th scope="col" className="py-1.5 pr-4 font-medium">Keys</th>
            <th scope="col" className="py-1.5 font-medium">Action</th>
          </tr>
        </thead>
        <tbody>
          {shown.map((s) => (
            <tr key={s.action} className="border-b border-rule/60">
              <td className="py-1 pr-4 whitespace-nowrap">
                <kbd className="rounded border border-rule-strong bg-paper px-1.5 py-0.5 text-xs">{s.keys}</kbd>
              </td>
              <td className="py-1">{s.description}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-3 text-xs text-ink-soft">
        Mouse: drag from a block&apos;s right-hand port to another block&apos;s input to draw a wire; Shift-drag on empty canvas
        selects an area; Ctrl-click adds to the selection; the wheel pans the canvas (Shift + wheel sideways; on a window
        narrower than 1024 px, where the page scrolls, the wheel scrolls it); Ctrl/⌘ + wheel (or a pinch) zooms the canvas.
      </p>
    </Dialog>
  );
}
