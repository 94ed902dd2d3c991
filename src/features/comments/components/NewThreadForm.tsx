import { useState } from "react";
import { createThreadSchema, type CommentPin } from "@shared/api/comments";
import { Button } from "@/components/Button";
import { FormError, SelectField, TextAreaField } from "@/components/Field";
import { errorMessage } from "@/lib/apiClient";
import { useCreateThread } from "@/features/comments/api/createThread";
import { pinChoices, pinOfValue, pinValue, type PinnableDoc } from "@/features/comments/lib/pinChoices";

interface Props {
  diagramId: string;
  version: number;
  doc: PinnableDoc;
  /** The block or wire selected on the canvas: the pin the form suggests. */
  selected: CommentPin | null;
}

/** Starts a thread on the version: the text and, optionally, the block or wire it is about. */
export function NewThreadForm({ diagramId, version, doc, selected }: Props) {
  const choices = pinChoices(doc);
  const suggested = choices.some((c) => c.value === pinValue(selected)) ? pinValue(selected) : "";
  const [body, setBody] = useState("");
  // null: follow the canvas selection until the user picks a pin here.
  const [chosen, setChosen] = useState<string | null>(null);
  const [error, setError] = useState<string>();
  const create = useCreateThread(diagramId, version);
  const pinned = chosen ?? suggested;

  const submit = () => {
    const parsed = createThreadSchema.safeParse({ body, pin: pinOfValue(pinned) });
    if (!parsed.success) return setError(parsed.error.issues.map((i) => i.message).join("; "));
    setError(undefined);
    create.mutate(parsed.data, {
      onSuccess: () => {
        setBody("");
        setChosen(null);
      },
      onError: (e) => setError(errorMessage(e)),
    });
  };

  return (
    <form
      aria-label="Start a thread"
      className="flex flex-col gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <TextAreaField label="New comment" value={body} onChange={(e) => setBody(e.target.value)} placeholder="What should the author check?" />
      <SelectField label="Pin to" value={pinned} onChange={(e) => setChosen(e.target.value)} hint="Select a block on the canvas to pin to it.">
        {choices.map((c) => (
          <option key={c.value} value={c.value}>
            {c.label}
          </option>
        ))}
      </SelectField>
      <FormError message={error} />
      <div className="flex justify-end">
        <Button type="submit" variant="primary" size="sm" pending={create.isPending}>
          Add comment
        </Button>
      </div>
    </form>
  );
}
