import { shellFrame, ShellBody } from "@/app/layout/ShellBody";
import { Logo } from "@/components/Logo";

/**
 * The frame of a page opened from a share link: the product's name and the safety caution, but no session,
 * sign-in or team navigation (the reader may have no account, and the link grants nothing beyond its page).
 */
export function SharedShell() {
  return (
    <div className={shellFrame(true)}>
      <header className="border-b border-rule bg-paper-raised">
        <div className="flex items-center gap-2 px-4 py-3 text-lg font-semibold tracking-tight sm:px-6">
          <Logo className="size-7" />
          Loopwright
          <span className="ml-2 text-xs font-medium tracking-wide text-ink-faint uppercase">Shared read-only view</span>
        </div>
      </header>
      <ShellBody wide fill />
    </div>
  );
}
