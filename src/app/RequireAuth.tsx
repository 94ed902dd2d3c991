import { Navigate, Outlet, useLocation, useOutletContext } from "react-router-dom";
import type { UserView } from "@shared/api/auth";
import { useMe } from "@/features/auth/api/getMe";
import { LoadError, Loading } from "@/components/QueryState";
import { href, paths } from "@shared/routes";

/** Gate for signed-in pages: signed-out visitors go to /sign-in?next=<where they were going>. */
export function RequireAuth() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <Loading label="Checking your session…" />;
  if (me.isError) return <LoadError what="your session" error={me.error} onRetry={() => me.refetch()} />;
  if (!me.data) {
    const here = location.pathname + location.search;
    return <Navigate to={here === paths.home ? paths.signIn : href.signIn(here)} replace />;
  }
  return <Outlet context={me.data satisfies UserView} />;
}

/** The signed-in user, for pages under RequireAuth. */
export const useUser = () => useOutletContext<UserView>();
