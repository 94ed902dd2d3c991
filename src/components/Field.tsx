import {
  useId,
  type InputHTMLAttributes,
  type ReactNode,
  type Ref,
  type SelectHTMLAttributes,
  type TextareaHTMLAttributes,
} from "react";

const controlClass =
  "w-full rounded border border-rule-strong px-3 py-2 text-sm placeholder:text-ink-faint aria-invalid:border-fault";

interface FieldFrame {
  label: string;
  error?: string;
  hint?: ReactNode;
}

function Frame({ id, label, error, hint, children }: FieldFrame & { id: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      {children}
      {hint && !error && (
        <p id={`${id}-hint`} className="text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-xs font-medium text-fault">
          {error}
        </p>
      )}
    </div>
  );
}

const describedBy = (id: string, f: FieldFrame) => (f.error ? `${id}-error` : f.hint ? `${id}-hint` : undefined);

type InputProps = FieldFrame & InputHTMLAttributes<HTMLInputElement> & { ref?: Ref<HTMLInputElement> };

/** A labelled text input whose error is announced with it (aria-invalid + aria-describedby). */
export function TextField({ label, error, hint, className, ...input }: InputProps) {
  const id = useId();
  return (
    <Frame id={id} label={label} error={error} hint={hint}>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, { label, error, hint })}
        className={`${controlClass} ${input.readOnly ? "bg-paper-sunk text-ink-soft" : "bg-paper-raised text-ink"} ${className ?? ""}`}
        {...input}
      />
    </Frame>
  );
}

type SelectProps = FieldFrame & SelectHTMLAttributes<HTMLSelectElement> & { ref?: Ref<HTMLSelectElement> };

export function SelectField({ label, error, hint, className, children, ...select }: SelectProps) {
  const id = useId();
  return (
    <Frame id={id} label={label} error={error} hint={hint}>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, { label, error, hint })}
        className={`${controlClass} bg-paper-raised text-ink ${className ?? ""}`}
        {...select}
      >
        {children}
      </select>
    </Frame>
  );
}

type TextAreaProps = FieldFrame & TextareaHTMLAttributes<HTMLTextAreaElement> & { ref?: Ref<HTMLTextAreaElement> };

export function TextAreaField({ label, error, hint, className, ...area }: TextAreaProps) {
  const id = useId();
  return (
    <Frame id={id} label={label} error={error} hint={hint}>
      <textarea
        id={id}
        rows={3}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, { label, error, hint })}
        className={`${controlClass} bg-paper-raised text-ink ${className ?? ""}`}
        {...area}
      />
    </Frame>
  );
}

/** A form-level error (wrong password, rate limit, conflict) shown above the submit button. */
export function FormError({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded border border-fault/40 bg-fault-tint px-3 py-2 text-sm text-fault">
      {message}
    </p>
  );
}
