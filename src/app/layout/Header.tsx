import { Link, NavLink, useNavigate } from "react-router-dom";
import { toast } from "sonner";
import { useMe } from "@/features/auth/api/getMe";
import { useSignOut } from "@/features/auth/api/signOut";
import { Button, buttonClass } from "@/components/Button";
import { Logo } from "@/components/Logo";
import { TeamNav } from "@/app/layout/TeamNav";
import { errorMessage } from "@/lib/apiClient";
import { href, paths } from "@shared/routes";

export function Header() {
  const { data: user } = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();

  // flushSync: leave the signed-in page before the cleared session re-renders it, or RequireAuth would
  // bounce to /sign-in?next=<this page> as if the session had expired.
  const doSignOut = () =>
    signOut.mutateAsync().then(
      () => navigate(paths.signIn, { flushSync: true }),
      (e) => toast.error(`Could not sign out: ${errorMessage(e)}`),
    );

  return (
    <header className="border-b border-rule bg-paper-raised print:hidden">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-3 px-4 py-3 sm:px-6">
        <Link to={user ? paths.teams : paths.signIn} className="flex items-center gap-2 text-lg font-semibold tracking-tight">
          <Logo className="size-7" />
          Loopwright
        </Link>
        {user && (
          <nav aria-label="Main" className="flex flex-1 flex-wrap items-center gap-x-4 gap-y-2 text-sm">
            <NavLink to={paths.teams} end className="text-ink-soft hover:text-ink aria-[current=page]:font-semibold aria-[current=page]:text-ink">
              Teams
            </NavLink>
            <TeamNav />
          </nav>
        )}
        <div className="ml-auto flex items-center gap-3 text-sm">
          {user ? (
            <>
              <span className="text-ink-soft">
                Signed in as <strong className="font-medium text-ink" title={user.email}>{user.name}</strong>
              </span>
              <Button size="sm" pending={signOut.isPending} onClick={() => void doSignOut()}>
                Sign out
              </Button>
            </>
          ) : (
            <>
              <Link to={href.signIn()} className={buttonClass("quiet", "sm")}>
                Sign in
              </Link>
              <Link to={href.signUp()} className={buttonClass("secondary", "sm")}>
                Create account
              </Link>
            </>
          )}
        </div>
      </div>
    </header>
  );
}
