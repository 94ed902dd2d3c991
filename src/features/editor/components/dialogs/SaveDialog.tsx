import { useState } from "react";
import { Button } from "@/components/Button";
import { FormError, TextField } from "@/components/Field";
import { Dialog } from "@/features/editor/components/dialogs/Dialog";

interface Props {
  nextNumber: number;
  pending: boolean;
  error?: string;
  onSave: (message: string) => void;
  onClose: () => void;
}

/** Names the version about to be saved; the message is optional but makes the history readable. */
export function SaveDialog({ nextNumber, pending, error, onSave, onClose }: Props) {
  const [message, setMessage] = useState("");
  return (
    <Dialog title={`Save version ${nextNumber}`} onClose={onClose}>
      <form
        className="flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          onSave(message.trim());
        }}
      >
        <TextField
          label="What changed (optional)"
          value={message}
          maxLength={500}
          autoFocus
          onChange={(e) => setMessage(e.target.value)}
          hint="For example: Added lead compensator, raised K to 4."
        />
        <FormError message={error} />
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="primary" pending={pending}>Save version</Button>
        </div>
      </form>
    </Dialog>
  );
}
