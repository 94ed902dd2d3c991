import { useEffect, useState } from "react";
import { Link, useSearchParams } from "react-router-dom";
import { useQueryClient } from "@tanstack/react-query";
import { ReactFlowProvider } from "@xyflow/react";
import type { DiagramDetail, LatestVersionView } from "@shared/api/diagrams";
import { checkedSummary, type CheckedResult } from "@shared/api/versions";
import type { Problem } from "@shared/diagram/problems";
import { loadDiagram } from "@shared/diagram/validate";
import { PageTitle } from "@/components/PageTitle";
import { LoadError, Loading } from "@/components/QueryState";
import { editorDiagramQuery, useEditorDiagram } from "@/features/editor/api/getEditorDiagram";
import { useNewestVersion } from "@/features/editor/api/getNewestVersion";
import { useEditorVersion } from "@/features/editor/api/getEditorVersion";
import { VersionViewBanner } from "@/features/editor/components/VersionViewBanner";
import type { SavedVersion } from "@/features/editor/components/SessionBanners";
import { emptyDocument, withWireIds } from "@/features/editor/commands/document";
import type { EditorDoc } from "@/features/editor/commands/types";
import { EditorSession, type CommentsSlot, type ShareSlot } from "@/features/editor/components/EditorSession";
import { warmLiveWorker } from "@/features/editor/hooks/useLiveDiagram";
import { href } from "@shared/routes";
import { ProblemAlert } from "@/components/ProblemAlert";

type Opened = { ok: true; doc: EditorDoc; baseVersion: number } | { ok: false; problems: Problem[]; baseVersion: number };

/** The document the editor starts from: a saved version (the latest by default), or an empty sheet when none was saved. */
function openVersion(version: LatestVersionView | null): Opened {
  if (!version) return { ok: true, doc: emptyDocument(), baseVersion: 0 };
  const loaded = loadDiagram(version.document);
  if (!loaded.doc) return { ok: false, problems: loaded.problems, baseVersion: version.number };
  return { ok: true, doc: withWireIds(loaded.doc), baseVersion: version.number };
}
const openLatest = (detail: DiagramDetail) => openVersion(detail.latestVersion);

/** `?version=N`: the saved version to show read-only; null for the latest, opened for editing. */
function versionParam(value: string | null): number | null {
  const n = Number(value);
  return value !== null && Number.isInteger(n) && n > 0 ? n : null;
}

/** The newer of two views of the newest version (either may lag the other). */
const newerOf = (a: SavedVersion | null, b: SavedVersion | null): SavedVersion | null => (!a ? b : !b ? a : b.number > a.number ? b : a);

/** /diagrams/:id — loads the diagram and opens an editing session on its latest version (or `?version=N` read-only). */
export function EditorPage({ id, share, comments }: { id: string; share?: ShareSlot; comments?: CommentsSlot }) {
  const [params] = useSearchParams();
  const asked = versionParam(params.get("version"));
  // `?comment=<id>` (a mail's link) opens that comment; read once, as the session starts.
  const linkedComment = params.get("comment");
  return asked === null ? (
    <LatestEditor id={id} share={share} comments={comments} linkedComment={linkedComment} />
  ) : (
    <VersionViewer id={id} number={asked} comments={comments} linkedComment={linkedComment} />
  );
}

interface Review {
  comments?: CommentsSlot;
  linkedComment: string | null;
}

function DiagramTitle({ diagram: d }: { diagram: DiagramDetail["diagram"] }) {
  return (
    <PageTitle compact title={d.title} kicker={`Diagram in ${d.teamName}`}>
      <Link to={href.versions(d.id)} className="text-sm text-signal underline underline-offset-2">
        All versions
      </Link>
      <Link to={href.team(d.teamId)} className="text-sm text-signal underline underline-offset-2">
        ← Back to {d.teamName}
      </Link>
    </PageTitle>
  );
}

const Unopenable = ({ opened }: { opened: Opened & { ok: false } }) => (
  <ProblemAlert title={`Version ${opened.baseVersion} is not a diagram this editor can open.`} problems={opened.problems.map((p) => p.message)} />
);

/** One saved version, read-only whatever the role; a banner leads back to the latest and to the comparison. */
function VersionViewer({ id, number, comments, linkedComment }: { id: string; number: number } & Review) {
  const detail = useEditorDiagram(id);
  const version = useEditorVersion(id, number);
  useEffect(warmLiveWorker, []);
  if (detail.isPending || version.isPending) return <Loading label={`Loading version ${number}…`} />;
  if (detail.isError) return <LoadError what="this diagram" error={detail.error} onRetry={() => detail.refetch()} />;
  if (version.isError) return <LoadError what={`version ${number}`} error={version.error} onRetry={() => version.refetch()} />;
  const opened = openVersion(version.data);
  const { ok, problemCount } = checkedSummary(version.data.result as CheckedResult | null);
  return (
    <>
      <DiagramTitle diagram={detail.data.diagram} />
      <VersionViewBanner diagramId={id} version={version.data} latest={detail.data.latestVersion?.number ?? number} />
      {opened.ok ? (
        <ReactFlowProvider key={number}>
          <EditorSession
            diagram={detail.data.diagram}
            initialDoc={opened.doc}
            baseVersion={number}
            latestNow={null}
            onReload={async () => {}}
            viewOnly
            savedProblems={ok === false ? { number, count: problemCount } : null}
            comments={comments}
            linkedComment={linkedComment}
          />
        </ReactFlowProvider>
      ) : (
        <Unopenable opened={opened} />
      )}
    </>
  );
}

function LatestEditor({ id, share, comments, linkedComment }: { id: string; share?: ShareSlot } & Review) {
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
  const title = <DiagramTitle diagram={d} />;
  if (!current.opened.ok) {
    return (
      <>
        {title}
        <Unopenable opened={current.opened} />
      </>
    );
  }
  // The newest version's check as the poll reports it: the status says when the open version was saved with problems.
  const checked = newest.data;
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
          comments={comments}
          linkedComment={linkedComment}
          savedProblems={checked && checked.ok === false ? { number: checked.number, count: checked.problemCount } : null}
        />
      </ReactFlowProvider>
    </>
  );
}
