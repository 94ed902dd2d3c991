import { useState } from "react";
import { Button } from "@/components/Button";

interface Props {
  label: string;
  /** Accessible name of the first button, e.g. "Remove Ada Byron". */
  accessibleLabel: string;
  question: string;
  confirmLabel: string;
  pending: boolean;
  onConfirm: () => void;
}

/** A destructive action asked twice, inline, so no modal traps focus and keyboard users keep their place. */
export function ConfirmButton({ label, accessibleLabel, question, confirmLabel, pending, onConfirm }: Props) {
  const [asking, setAsking] = useState(false);
  if (!asking)
    return (
      <Button size="sm" variant="danger" aria-label={accessibleLabel} onClick={() => setAsking(true)}>
        {label}
      </Button>
    );
  return (
    <span role="group" aria-label={question} className="inline-flex flex-wrap items-center gap-2">
      <span className="text-xs text-ink-soft">{question}</span>
      <Button size="sm" variant="danger" pending={pending} onClick={onConfirm} autoFocus>
        {confirmLabel}
      </Button>
      <Button size="sm" variant="quiet" onClick={() => setAsking(false)}>
        Cancel
      </Button>
    </span>
  );
}
