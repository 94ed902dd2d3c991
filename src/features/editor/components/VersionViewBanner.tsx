import { Link } from "react-router-dom";
import type { LatestVersionView } from "@shared/api/diagrams";
import { formatDateTime } from "@/lib/format";
import { href } from "@shared/routes";

const link = "font-medium text-signal underline underline-offset-2";

/** Above a saved version opened read-only: which one it is, and the ways back to the latest. */
export function VersionViewBanner({ diagramId, version, latest }: { diagramId: string; version: LatestVersionView; latest: number }) {
  return (
    <div role="region" aria-label="Saved version" className="mb-3 flex flex-wrap items-center gap-x-4 gap-y-2 rounded border border-rule bg-paper-raised px-3 py-2 text-sm">
      <p className="flex-1">
        You are looking at <strong>v{version.number}</strong>, saved by {version.createdBy || "someone"} on {formatDateTime(version.createdAt)}
        {version.message ? ` (“${version.message}”)` : ""}. Read only{version.number === latest ? "; it is the latest version." : "."}
      </p>
      {version.number !== latest && (
        <>
          <Link className={link} to={href.compare(diagramId, version.number, latest)}>
            Compare with v{latest}
          </Link>
          <Link className={link} to={href.diagram(diagramId)}>
            Open the latest (v{latest})
          </Link>
        </>
      )}
      {version.number === latest && (
        <Link className={link} to={href.diagram(diagramId)}>
          Edit it
        </Link>
      )}
    </div>
  );
}
