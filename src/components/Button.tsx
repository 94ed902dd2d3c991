import type { ButtonHTMLAttributes, Ref } from "react";

const variants = {
  primary: "bg-signal text-white hover:bg-signal-strong border-signal-strong",
  secondary: "bg-paper-raised text-ink hover:bg-paper-sunk border-rule-strong",
  danger: "bg-paper-raised text-fault hover:bg-fault-tint border-fault/60",
  quiet: "bg-transparent text-signal hover:bg-signal-tint border-transparent",
} as const;

export type ButtonVariant = keyof typeof variants;

export const buttonClass = (variant: ButtonVariant = "secondary", size: "md" | "sm" = "md") =>
  [
    "inline-flex items-center justify-center gap-1.5 rounded border font-medium transition-colors",
    "disabled:cursor-not-allowed disabled:opacity-60",
    size === "md" ? "px-3.5 py-2 text-sm" : "px-2.5 py-1 text-xs",
    variants[variant],
  ].join(" ");

type Props = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: ButtonVariant;
  size?: "md" | "sm";
  pending?: boolean;
  ref?: Ref<HTMLButtonElement>;
};

/** A button that shows it is busy (and ignores clicks) while its request runs. */
export function Button({ variant, size, pending = false, disabled, className, type = "button", children, ...rest }: Props) {
  return (
    <button
      type={type}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={`${buttonClass(variant, size)} ${className ?? ""}`}
      {...rest}
    >
      {pending && <span aria-hidden className="size-3 animate-spin rounded-full border-2 border-current border-r-transparent" />}
      {children}
    </button>
  );
}
