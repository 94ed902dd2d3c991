import { Link, Navigate, useNavigate, useSearchParams } from "react-router-dom";
import { useMe } from "@/features/auth/api/getMe";
import { SignUpForm } from "@/features/auth/components/SignUpForm";
import { NarrowPage } from "@/components/NarrowPage";
import { href, safeNext } from "@/lib/paths";

export function SignUpRoute() {
  const [params] = useSearchParams();
  const next = safeNext(params.get("next"));
  const navigate = useNavigate();
  const me = useMe();
  if (me.data) return <Navigate to={next} replace />;
  return (
    <NarrowPage
      title="Create your Loopwright account"
      intro={
        <>
          Already have one?{" "}
          <Link to={href.signIn(params.get("next") ?? undefined)} className="text-signal underline underline-offset-2">
            Sign in
          </Link>
          .
        </>
      }
    >
      <SignUpForm onSignedUp={() => navigate(next, { replace: true })} />
    </NarrowPage>
  );
}
