import { Button } from "@/components/Button";
import { Dialog } from "@/features/editor/components/dialogs/Dialog";

/** Asked when a link would leave the editor with unsaved changes. */
export function LeaveDialog({ onStay, onLeave }: { onStay: () => void; onLeave: () => void }) {
  return (
    <Dialog title="Leave with unsaved changes?" onClose={onStay}>
      <p className="text-sm">
        Your changes are not saved as a version. They stay as a draft in this browser, and this diagram will offer to restore them
        when you come back.
      </p>
      <div className="mt-4 flex justify-end gap-2">
        <Button variant="quiet" onClick={onStay} autoFocus>Stay</Button>
        <Button variant="danger" onClick={onLeave}>Leave</Button>
      </div>
    </Dialog>
  );
}
