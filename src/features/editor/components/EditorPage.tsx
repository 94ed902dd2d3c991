import { useEffect, useState } from "react";
import { Link } from "react-router-dom";
import { useQueryClient } from "@tanstack/react-query";
import { ReactFlowProvider } from "@xyflow/react";
import type { DiagramDetail } from "@shared/api/diagrams";
import type { Problem } from "@shared/diagram/problems";
import { loadDiagram } from "@shared/diagram/validate";
import { PageTitle } from "@/components/PageTitle";
import { LoadError, Loading } from "@/components/QueryState";
import { editorDiagramQuery, useEditorDiagram } from "@/features/editor/api/getEditorDiagram";
import { useNewestVersion } from "@/features/editor/api/getNewestVersion";
import type { SavedVersion } from "@/features/editor/components/SessionBanners";
import { emptyDocument, withWireIds } from "@/features/editor/commands/document";
import type { EditorDoc } from "@/features/editor/commands/types";
import { EditorSession, type ShareSlot } from "@/features/editor/components/EditorSession";
import { warmLiveWorker } from "@/features/editor/hooks/useLiveDiagram";
import { href } from "@shared/routes";

type Opened = { ok: true; doc: EditorDoc; baseVersion: number } | { ok: false; problems: Problem[]; baseVersion: number };

/** The document the editor starts from: the latest version, or an empty sheet when none was saved. */
function openLatest(detail: DiagramDetail): Opened {
  const latest = detail.latestVersion;
  if (!latest) return { ok: true, doc: emptyDocument(), baseVersion: 0 };
  const loaded = loadDiagram(latest.document);
  if (!loaded.doc) return { ok: false, problems: loaded.problems, baseVersion: latest.number };
  return { ok: true, doc: withWireIds(loaded.doc), baseVersion: latest.number };
}

/** The newer of two views of the newest version (either may lag the other). */
const newerOf = (a: SavedVersion | null, b: SavedVersion | null): SavedVersion | null => (!a ? b : !b ? a : b.number > a.number ? b : a);

/** /diagrams/:id — loads the diagram and opens an editing session on its latest version. */
export function EditorPage({ id, share }: { id: string; share?: ShareSlot }) {
  const detail = useEditorDiagram(id);
  // A teammate's save shows within a few seconds: the newest version is polled apart from the (large) detail.
  const newest = useNewestVersion(id);
  const queryClient = useQueryClient();
  // A session lives until the user reloads on purpose; background refetches only feed the "newer version" notice.
  const [session, setSession] = useState<{ key: number; opened: Opened } | null>(null);
  // The algebra loads in the editor worker while the diagram is fetched, not after the canvas has rendered.
  useEffect(warmLiveWorker, []);

  if (detail.isPending) return <Loading label="Loading the diagram…" />;
  if (detail.isError) return <LoadError what="this diagram" error={detail.error} onRetry={() => detail.refetch()} />;
  const current = session ?? { key: 0, opened: openLatest(detail.data) };
  if (!session) setSession(current);

  const reload = async () => {
    const fresh = await queryClient.fetchQuery({ ...editorDiagramQuery(id), staleTime: 0 });
    setSession({ key: current.key + 1, opened: openLatest(fresh) });
  };

  const d = detail.data.diagram;
  const title = (
    <PageTitle title={d.title} kicker={`Diagram in ${d.teamName}`}>
      <Link to={href.team(d.teamId)} className="text-sm text-signal underline underline-offset-2">
        ← Back to {d.teamName}
      </Link>
    </PageTitle>
  );
  if (!current.opened.ok) {
    return (
      <>
        {title}
        <div role="alert" className="rounded border border-fault/40 bg-fault-tint px-4 py-3 text-sm">
          <p className="font-medium text-fault">Version {current.opened.baseVersion} is not a diagram this editor can open.</p>
          <ul className="mt-2 list-disc pl-5">
            {current.opened.problems.map((p, i) => (
              <li key={i}>{p.message}</li>
            ))}
          </ul>
        </div>
      </>
    );
  }
  return (
    <>
      {title}
      <ReactFlowProvider key={current.key}>
        <EditorSession
          diagram={d}
          initialDoc={current.opened.doc}
          baseVersion={current.opened.baseVersion}
          latestNow={newerOf(detail.data.latestVersion, newest.data ?? null)}
          onReload={reload}
          share={share}
        />
      </ReactFlowProvider>
    </>
  );
}
