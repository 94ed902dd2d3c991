import { Link, Navigate, useNavigate, useSearchParams } from "react-router-dom";
import { useMe } from "@/features/auth/api/getMe";
import { SignInForm } from "@/features/auth/components/SignInForm";
import { NarrowPage } from "@/components/NarrowPage";
import { href, safeNext } from "@/lib/paths";

export function SignInRoute() {
  const [params] = useSearchParams();
  const next = safeNext(params.get("next"));
  const navigate = useNavigate();
  const me = useMe();
  if (me.data) return <Navigate to={next} replace />;
  return (
    <NarrowPage
      title="Sign in to Loopwright"
      intro={
        <>
          New here?{" "}
          <Link to={href.signUp(params.get("next") ?? undefined)} className="text-signal underline underline-offset-2">
            Create an account
          </Link>
          .
        </>
      }
    >
      <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
    </NarrowPage>
  );
}
