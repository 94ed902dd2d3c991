import { Link, Navigate } from "react-router-dom";
import { useAuthDestination } from "@/features/auth/hooks/useAuthDestination";
import { SignInForm } from "@/features/auth/components/SignInForm";
import { NarrowPage } from "@/components/NarrowPage";
import { href } from "@shared/routes";

export function SignInRoute() {
  const { next, forwardNext, signedIn, goNext } = useAuthDestination();
  if (signedIn) return <Navigate to={next} replace />;
  return (
    <NarrowPage
      title="Sign in to Loopwright"
      intro={
        <>
          New here?{" "}
          <Link to={href.signUp(forwardNext)} className="text-signal underline underline-offset-2">
            Create an account
          </Link>
          .
        </>
      }
    >
      <SignInForm onSignedIn={goNext} />
    </NarrowPage>
  );
}
