import { useState } from "react";
import { Link, useNavigate, useParams } from "react-router-dom";
import { toast } from "sonner";
import type { UserView } from "@shared/api/auth";
import type { InvitationPreview } from "@shared/api/teams";
import { useMe } from "@/features/auth/api/getMe";
import { useSignOut } from "@/features/auth/api/signOut";
import { SignUpForm } from "@/features/auth/components/SignUpForm";
import { useAcceptInvitation } from "@/features/invitations/api/acceptInvitation";
import { useInvitation } from "@/features/invitations/api/getInvitation";
import { InvitationCard } from "@/features/invitations/components/InvitationCard";
import { Button, buttonClass } from "@/components/Button";
import { FormError } from "@/components/Field";
import { NarrowPage } from "@/components/NarrowPage";
import { LoadError, Loading } from "@/components/QueryState";
import { errorMessage } from "@/lib/apiClient";
import { href, paths } from "@shared/routes";

/** /invite/:token — shows the invitation, then the one next step that fits who is looking at it. */
export function InviteRoute() {
  const token = useParams().token!;
  const invitation = useInvitation(token);
  const me = useMe();
  if (invitation.isPending || me.isPending) return <Loading label="Opening the invitation…" />;
  if (invitation.isError)
    return (
      <NarrowPage title="Invitation unavailable">
        <LoadError what="this invitation" error={invitation.error} onRetry={() => invitation.refetch()} />
        <p className="text-sm text-ink-soft">Ask the person who invited you to send a new invitation.</p>
      </NarrowPage>
    );
  if (me.isError) return <LoadError what="your session" error={me.error} onRetry={() => me.refetch()} />;
  const inv = invitation.data;
  return (
    <NarrowPage title={`Join ${inv.teamName}`} intro={`${inv.invitedBy} invited you to this Loopwright team.`}>
      <InvitationCard invitation={inv} />
      <div className="mt-6 border-t border-rule pt-6">
        <NextStep token={token} invitation={inv} user={me.data} />
      </div>
    </NarrowPage>
  );
}

function NextStep({ token, invitation: inv, user }: { token: string; invitation: InvitationPreview; user: UserView | null }) {
  const accept = useAcceptInvitation(token);
  const signOut = useSignOut();
  const navigate = useNavigate();
  const [acceptError, setAcceptError] = useState<string>();

  const join = () => {
    setAcceptError(undefined);
    return accept.mutateAsync().then(
      (teamId) => {
        toast.success(`Welcome to ${inv.teamName}.`);
        navigate(href.team(teamId), { replace: true });
      },
      (e) => setAcceptError(errorMessage(e)),
    );
  };

  if (!user && inv.accountExists)
    return (
      <div className="flex flex-col gap-3 text-sm">
        <p>
          There is already a Loopwright account for <strong>{inv.email}</strong>. Sign in with it to join.
        </p>
        <Link to={href.signIn(href.invite(token))} className={`${buttonClass("primary")} self-start`}>
          Sign in to join
        </Link>
      </div>
    );

  if (!user)
    return (
      <>
        <h2 className="mb-4 text-base font-semibold">Create your account</h2>
        <SignUpForm lockedEmail={inv.email} submitLabel={`Create account and join ${inv.teamName}`} onSignedUp={join} />
        <FormError message={acceptError} />
      </>
    );

  if (user.email.toLowerCase() !== inv.email.toLowerCase())
    return (
      <div className="flex flex-col gap-3 text-sm">
        <p role="alert" className="rounded border border-trace/50 bg-trace-tint px-3 py-2">
          You are signed in as <strong>{user.email}</strong>, but this invitation is for <strong>{inv.email}</strong>. Sign
          out, then sign in or create an account with {inv.email}.
        </p>
        <Button
          className="self-start"
          pending={signOut.isPending}
          onClick={() => signOut.mutate(undefined, { onError: (e) => toast.error(errorMessage(e)) })}
        >
          Sign out
        </Button>
      </div>
    );

  return (
    <div className="flex flex-col gap-3">
      <FormError message={acceptError} />
      <Button variant="primary" className="self-start" pending={accept.isPending} onClick={() => void join()}>
        Join {inv.teamName}
      </Button>
      <Link to={paths.teams} className="text-sm text-signal underline underline-offset-2">
        Not now — go to my teams
      </Link>
    </div>
  );
}
