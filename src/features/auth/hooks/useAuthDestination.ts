import { useNavigate, useSearchParams } from "react-router-dom";
import { useMe } from "@/features/auth/api/getMe";
import { safeNext } from "@shared/routes";

/**
 * Where the sign-in and sign-up pages send the user: the same-site `?next=` page (else the team list),
 * passed on when switching between the two pages, and whether they are signed in already.
 */
export function useAuthDestination() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const next = safeNext(params.get("next"));
  return {
    next,
    /** The raw `next` to hand to the other auth page's link. */
    forwardNext: params.get("next") ?? undefined,
    signedIn: Boolean(me.data),
    goNext: () => navigate(next, { replace: true }),
  };
}
