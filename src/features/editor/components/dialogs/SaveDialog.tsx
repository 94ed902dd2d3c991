import { useId, useState } from "react";
import type { Problem } from "@shared/diagram/problems";
import { Button } from "@/components/Button";
import { FormError, TextField } from "@/components/Field";
import { Dialog } from "@/features/editor/components/dialogs/Dialog";
import { counted, plural } from "@shared/text/words";

interface Props {
  nextNumber: number;
  pending: boolean;
  error?: string;
  /** Errors in the document about to be saved: the version is stored with them only once the user confirms. */
  problems: Problem[];
  onSave: (message: string) => void;
  onClose: () => void;
}

/** Names the version about to be saved; the message is optional but makes the history readable. */
export function SaveDialog({ nextNumber, pending, error, problems, onSave, onClose }: Props) {
  const [message, setMessage] = useState("");
  const [anyway, setAnyway] = useState(false);
  const confirmId = useId();
  const blocked = problems.length > 0 && !anyway;
  return (
    <Dialog title={`Save version ${nextNumber}`} onClose={onClose}>
      <form
        className="flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          if (!blocked) onSave(message.trim());
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
        {problems.length > 0 && (
          <div role="alert" className="rounded border border-fault/40 bg-fault-tint px-3 py-2 text-sm">
            <p className="font-medium text-fault">
              This document has {counted(problems.length, "problem")}; the version will be stored with {plural(problems.length, "it", "them")} and
              its result marked as failed.
            </p>
            <ul className="mt-1 list-disc pl-5">
              {problems.slice(0, 5).map((p, i) => (
                <li key={i}>{p.message}</li>
              ))}
              {problems.length > 5 && <li>and {problems.length - 5} more (see the Problems panel)</li>}
            </ul>
            <p className="mt-2 flex items-center gap-2">
              <input id={confirmId} type="checkbox" checked={anyway} onChange={(e) => setAnyway(e.target.checked)} className="size-4 accent-fault" />
              <label htmlFor={confirmId}>Save anyway, with these problems</label>
            </p>
          </div>
        )}
        <FormError message={error} />
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="primary" pending={pending} disabled={blocked}>
            {problems.length > 0 ? "Save with problems" : "Save version"}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
