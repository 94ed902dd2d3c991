import { useState } from "react";
import { Copy } from "lucide-react";
import { toast } from "sonner";
import { createShareLinkSchema, MAX_SHARE_LINK_DAYS, type CreatedShareLink } from "@shared/api/shareLinks";
import { Button } from "@/components/Button";
import { FormError, TextField } from "@/components/Field";
import { LoadError, Loading } from "@/components/QueryState";
import { errorMessage } from "@/lib/apiClient";
import { formatDateTime } from "@/lib/format";
import { useCreateShareLink } from "@/features/shareLinks/api/createShareLink";
import { useShareLinks } from "@/features/shareLinks/api/getShareLinks";
import { ShareLinksTable } from "@/features/shareLinks/components/ShareLinksTable";

interface Props {
  diagramId: string;
  /** The version open in the editor; 0 before the first save. */
  openVersion: number;
}

const copy = (url: string) =>
  navigator.clipboard.writeText(url).then(
    () => toast.success("Link copied."),
    () => toast.error("The browser refused clipboard access; select the link and copy it instead."),
  );

/** The share dialog's body: make a read-only link (latest or the open version, optional expiry), copy it, list and revoke. */
export function SharePanel({ diagramId, openVersion }: Props) {
  const [target, setTarget] = useState<"latest" | "open">("latest");
  const [days, setDays] = useState("");
  const [error, setError] = useState<string>();
  const [created, setCreated] = useState<CreatedShareLink | null>(null);
  const create = useCreateShareLink(diagramId);
  const links = useShareLinks(diagramId);

  if (openVersion === 0) return <p className="text-sm text-ink-soft">Save a version first: a share link opens a saved version.</p>;

  const submit = () => {
    if (!/^\s*\d*\s*$/.test(days)) return setError(`Expires after: a whole number of days from 1 to ${MAX_SHARE_LINK_DAYS}, or empty for never.`);
    const parsed = createShareLinkSchema.safeParse({
      version: target === "open" ? openVersion : null,
      expiresInDays: days.trim() === "" ? null : Number(days),
    });
    if (!parsed.success) return setError(parsed.error.issues.map((i) => i.message).join("; "));
    setError(undefined);
    create.mutate(parsed.data, { onSuccess: setCreated, onError: (e) => setError(errorMessage(e)) });
  };

  return (
    <div className="flex flex-col gap-5">
      <form
        className="flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          submit();
        }}
      >
        <fieldset className="flex flex-col gap-1.5 text-sm">
          <legend className="mb-1 font-medium">The link opens</legend>
          <label className="flex items-center gap-2">
            <input type="radio" name="share-target" checked={target === "latest"} onChange={() => setTarget("latest")} />
            The latest version, whichever it is when opened
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" name="share-target" checked={target === "open"} onChange={() => setTarget("open")} />
            Version {openVersion} only (the one open here)
          </label>
        </fieldset>
        <TextField
          label="Expires after (days)"
          inputMode="numeric"
          value={days}
          onChange={(e) => setDays(e.target.value)}
          placeholder="never"
          hint={`Leave empty for a link that works until revoked; at most ${MAX_SHARE_LINK_DAYS} days.`}
        />
        <FormError message={error} />
        <div className="flex justify-end">
          <Button type="submit" variant="primary" pending={create.isPending}>Create link</Button>
        </div>
      </form>
      {created && (
        <div role="region" aria-label="Link created" className="flex flex-col gap-2 rounded border border-signal/40 bg-signal-tint p-3">
          <TextField label="Share link" readOnly value={created.url} onFocus={(e) => e.currentTarget.select()} />
          <p className="text-xs text-ink-soft">
            Opens {created.version === null ? "the latest version" : `version ${created.version}`} read-only, without an account,{" "}
            {created.expiresAt ? `until ${formatDateTime(created.expiresAt)}` : "until revoked"}. It is shown only now: copy it.
          </p>
          <div>
            <Button size="sm" onClick={() => void copy(created.url)}>
              <Copy className="size-3.5" aria-hidden /> Copy link
            </Button>
          </div>
        </div>
      )}
      <section aria-label="Links to this diagram">
        <h3 className="mb-2 text-sm font-semibold">Links to this diagram</h3>
        {links.isPending ? (
          <Loading label="Loading the share links…" />
        ) : links.isError ? (
          <LoadError what="the share links" error={links.error} onRetry={() => links.refetch()} />
        ) : (
          <ShareLinksTable links={links.data} diagramId={diagramId} caption="Share links of this diagram" />
        )}
      </section>
    </div>
  );
}
