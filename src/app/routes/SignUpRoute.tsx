import { Link, Navigate } from "react-router-dom";
import { useAuthDestination } from "@/features/auth/hooks/useAuthDestination";
import { SignUpForm } from "@/features/auth/components/SignUpForm";
import { NarrowPage } from "@/components/NarrowPage";
import { href } from "@shared/routes";

export function SignUpRoute() {
  const { next, forwardNext, signedIn, goNext } = useAuthDestination();
  if (signedIn) return <Navigate to={next} replace />;
  return (
    <NarrowPage
      title="Create your Loopwright account"
      intro={
        <>
          Already have one?{" "}
          <Link to={href.signIn(forwardNext)} className="text-signal underline underline-offset-2">
            Sign in
          </Link>
          .
        </>
      }
    >
      <SignUpForm onSignedUp={goNext} />
    </NarrowPage>
  );
}
