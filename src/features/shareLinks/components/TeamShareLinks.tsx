import { LoadError, Loading } from "@/components/QueryState";
import { useTeamShareLinks } from "@/features/shareLinks/api/getTeamShareLinks";
import { ShareLinksTable } from "@/features/shareLinks/components/ShareLinksTable";

/** The team page's list of every read-only link to its diagrams (editors and owners make and see them). */
export function TeamShareLinks({ teamId }: { teamId: string }) {
  const links = useTeamShareLinks(teamId);
  if (links.isPending) return <Loading label="Loading the share links…" />;
  if (links.isError) return <LoadError what="the share links" error={links.error} onRetry={() => links.refetch()} />;
  return (
    <>
      <p className="mb-3 text-sm text-ink-soft">
        Anyone holding one of these links can read the version it opens, without an account. Revoke a link that is no longer needed.
      </p>
      <ShareLinksTable links={links.data} caption="Share links of this team's diagrams" />
    </>
  );
}
