import type { ReactNode } from "react";
import { Button } from "@/components/Button";
import { errorMessage, isApiError } from "@/lib/apiClient";

export function Loading({ label }: { label: string }) {
  return (
    <p role="status" className="flex items-center gap-2 py-6 text-sm text-ink-soft">
      <span aria-hidden className="size-3.5 animate-spin rounded-full border-2 border-signal border-r-transparent" />
      {label}
    </p>
  );
}

/** A failed load: says what failed and offers a retry unless retrying cannot help (404, 403). */
export function LoadError({ what, error, onRetry }: { what: string; error: unknown; onRetry?: () => void }) {
  const final = isApiError(error, 404) || isApiError(error, 403) || isApiError(error, 410);
  return (
    <div role="alert" className="my-4 rounded border border-fault/40 bg-fault-tint px-4 py-3 text-sm">
      <p className="font-medium text-fault">Could not load {what}.</p>
      <p className="mt-1 text-ink">{errorMessage(error)}</p>
      {onRetry && !final && (
        <Button size="sm" className="mt-3" onClick={onRetry}>
          Try again
        </Button>
      )}
    </div>
  );
}

export function Empty({ children }: { children: ReactNode }) {
  return (
    <div className="rounded border border-dashed border-rule-strong bg-paper-raised px-4 py-8 text-center text-sm text-ink-soft">
      {children}
    </div>
  );
}
