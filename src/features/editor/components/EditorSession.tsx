import { useCallback, useMemo, useRef, useState, type ReactNode } from "react";
import type { CommentPin, PinnedThread } from "@shared/api/comments";
import { counted } from "@shared/text/words";
import type { DiagramDetail } from "@shared/api/diagrams";
import type { Problem } from "@shared/diagram/problems";
import type { EditorDoc, Point, Selection } from "@/features/editor/commands/types";
import { done } from "@/features/editor/commands/types";
import { moveBlocks } from "@/features/editor/commands/blocks";
import { EditorContext, type Act } from "@/features/editor/components/EditorContext";
import { CanvasNotice, type Notice } from "@/features/editor/components/CanvasNotice";
import { CommentPins } from "@/features/editor/components/CommentPins";
import { DiagramCanvas } from "@/features/editor/components/DiagramCanvas";
import { BlockRail } from "@/features/editor/components/BlockRail";
import { EditorToolbar } from "@/features/editor/components/EditorToolbar";
import { ImportVersion } from "@/features/editor/components/ImportVersion";
import { versionExports } from "@/features/editor/api/versionExport";
import { SessionBanners, type SavedVersion } from "@/features/editor/components/SessionBanners";
import { SessionDialogs } from "@/features/editor/components/SessionDialogs";
import { Dialog } from "@/features/editor/components/dialogs/Dialog";
import { CompareWithLocal } from "@/features/editor/components/compare/CompareWithLocal";
import { SidePanel } from "@/features/editor/components/SidePanel";
import { EditorWorkspace } from "@/features/editor/components/EditorWorkspace";
import { ResultsColumn } from "@/features/editor/components/ResultsColumn";
import { StepBadge } from "@/features/editor/components/StepBadge";
import { PropertiesPanel } from "@/features/editor/components/panels/PropertiesPanel";
import { boundsOf } from "@shared/geometry/blockBox";
import { nodeBox } from "@/features/editor/geometry/nodeBox";
import { useCanvasCommands } from "@/features/editor/hooks/useCanvasCommands";
import { useDraft } from "@/features/editor/hooks/useDraft";
import { useEditorHistory } from "@/features/editor/hooks/useEditorHistory";
import { useFitBox } from "@/features/editor/hooks/useFitBox";
import { useFlowState } from "@/features/editor/hooks/useFlowState";
import { useLiveDiagram, type AnalysisSettings } from "@/features/editor/hooks/useLiveDiagram";
import { selectedPin, useReviewComments } from "@/features/editor/hooks/useReviewComments";
import { useSaveFlow } from "@/features/editor/hooks/useSaveFlow";
import { useUnsavedGuard } from "@/features/editor/hooks/useUnsavedGuard";
import { problemMarks, stepFootprint } from "@/features/editor/lib/marks";
import { pairKey, resultView } from "@/features/editor/lib/resultView";

/** The share dialog's body for a diagram and the version open; the app passes it in from the share-links feature. */
export type ShareSlot = (target: { diagramId: string; openVersion: number }) => ReactNode;

/** What the review comments of the open saved version get from the editor, and tell it back (pins, open count). */
export interface CommentsTarget {
  diagramId: string;
  /** The saved version open; 0 before the first save. */
  version: number;
  /** That version's document as saved (local edits are not what reviewers comment on). */
  doc: EditorDoc;
  selected: CommentPin | null;
  focus: { commentId: string; at: number } | null;
  onThreads: (summary: { pins: PinnedThread[]; open: number }) => void;
  onShowPin: (pin: CommentPin) => void;
}
/** The comments panel; the app passes it in from the comments feature. */
export type CommentsSlot = (target: CommentsTarget) => ReactNode;

interface Props {
  diagram: DiagramDetail["diagram"];
  initialDoc: EditorDoc;
  baseVersion: number;
  /** The latest version the server knows now (refetched in the background). */
  latestNow: SavedVersion | null;
  onReload: () => Promise<void>;
  /** Read only whatever the role: nothing to save, no draft kept, no team notices (a share link's reader). */
  viewOnly?: boolean;
  /** Offers the toolbar's Share action to editors and owners. */
  share?: ShareSlot;
  /** A saved version whose server check found errors; the status says so while that version is open unchanged. */
  savedProblems?: { number: number; count: number } | null;
  /** Offers the review comments of the open version in the side panel, with their pins on the canvas. */
  comments?: CommentsSlot;
  /** A comment to open at once (a mail's link): the side panel starts on the comments with its thread in view. */
  linkedComment?: string | null;
}

/** Whether any slider stands away from its parameter's nominal value. */
const slidersMoved = (r: { analysis: { values: Record<string, number> }; parameters: { name: string; nominal: number }[] }) =>
  r.parameters.some((p) => r.analysis.values[p.name] !== p.nominal);

/** One editing session on one version: document + history, canvas, panels, live result, saving. */
export function EditorSession(props: Props) {
  const { diagram, initialDoc, baseVersion, latestNow, onReload, viewOnly = false, share, savedProblems = null, comments, linkedComment = null } = props;
  const readOnly = viewOnly || diagram.role === "viewer";
  const history = useEditorHistory(initialDoc);
  const { doc, run } = history;
  const [savedDoc, setSavedDoc] = useState(initialDoc);
  const [base, setBase] = useState(baseVersion);
  const dirty = doc !== savedDoc;
  const draft = useDraft(diagram.id, base, doc, dirty && !readOnly, initialDoc);
  const guard = useUnsavedGuard(dirty && !readOnly);
  const fitBox = useFitBox();

  const [notice, setNotice] = useState<Notice | null>(null);
  const pointer = useRef<Point | null>(null);
  const clearNotice = useCallback(() => setNotice(null), []);

  // The pair the user chose; none: the first input and output, which is also the results panel's default.
  const [pair, setPair] = useState<{ input: string; output: string } | null>(null);
  // Slider values, band, swept parameter and break live here, not in the document: analysing never dirties it.
  const [analysisSettings, setAnalysisSettings] = useState<AnalysisSettings>({ values: {}, band: 0.02, sweepParameter: null, sweepShown: false, sweepNegative: false, break: null });
  const changeAnalysis = useCallback((change: Partial<AnalysisSettings>) => setAnalysisSettings((s) => ({ ...s, ...change })), []);
  const { result: live, analysis } = useLiveDiagram(doc, { ...analysisSettings, input: pair?.input ?? null, output: pair?.output ?? null });
  const view = useMemo(() => resultView(live.outcome, pair && pairKey(pair)), [live.outcome, pair]);
  const choosePair = useCallback(
    (key: string) => {
      const t = view.transfers.find((x) => pairKey(x) === key);
      setPair(t ? { input: t.input, output: t.output } : null);
    },
    [view.transfers],
  );
  const [stepAt, setStepAt] = useState<number | null>(null);
  const step = stepAt === null ? null : (view.steps[stepAt] ?? null);
  const footprint = useMemo(() => (step && stepAt !== null ? stepFootprint(view.steps, stepAt) : null), [step, stepAt, view.steps]);
  const usedBreak = analysis.result?.breakWire ?? null;
  const marks = useMemo(() => problemMarks(view.problems, footprint, usedBreak?.id ?? null), [view.problems, footprint, usedBreak?.id]);

  const selectRef = useRef<(s: Selection) => void>(() => {});
  const act = useCallback<Act>(
    (label, command, opts) => {
      if (readOnly) return false;
      const outcome = run(label, command, opts);
      if (outcome.ok) {
        if (outcome.select) selectRef.current(outcome.select);
        return true;
      }
      setNotice({ message: outcome.reason, at: opts?.at ?? null, key: Date.now() });
      return false;
    },
    [readOnly, run],
  );
  const onMoved = useCallback(
    (moves: Record<string, Point>) =>
      act("Move", (d) => moveBlocks(d, moves), { coalesce: `move:${Object.keys(moves).sort().join(",")}` }),
    [act],
  );
  const canvasState = useFlowState(doc, marks, onMoved);
  selectRef.current = canvasState.setSelection;
  const { selection, setSelection } = canvasState;

  const save = useSaveFlow({
    diagram,
    doc,
    baseVersion: base,
    onSaved: (v, sent) => {
      setBase(v.number);
      setSavedDoc(sent);
      draft.clear();
    },
    onLeaving: () => {
      draft.clear();
      guard.allowLeave();
    },
  });
  const [help, setHelp] = useState(false);
  const [sharing, setSharing] = useState(false);
  const [comparing, setComparing] = useState<number | null>(null);
  const firstField = useRef<HTMLInputElement>(null);
  const canvasBox = useRef<HTMLDivElement>(null);

  const commands = useCanvasCommands({
    doc,
    act,
    readOnly,
    selection,
    setSelection,
    measured: canvasState.measured,
    nodes: canvasState.nodes,
    canvasBox,
    pointer,
    undo: history.undo,
    redo: history.redo,
    onSave: save.open,
    onHelp: () => setHelp(true),
    focusProperties: () => firstField.current?.focus(),
    steps: { count: view.steps.length, at: stepAt, go: setStepAt },
  });

  /** Selects a block or a wire and brings it into view. */
  const showOnCanvas = (blockId: string | undefined, wireId: string | undefined) => {
    const wire = wireId ? doc.wires.find((w) => w.id === wireId) : undefined;
    const block = blockId && doc.blocks.some((b) => b.id === blockId) ? blockId : undefined;
    const sel: Selection = block ? { blocks: [block], wires: [] } : wire ? { blocks: [], wires: [wire.id] } : { blocks: [], wires: [] };
    setSelection(sel);
    const around = block ? [block] : wire ? [wire.from, wire.to] : [];
    if (around.length) fitBox(boundsOf(canvasState.nodes.filter((n) => around.includes(n.id)).map(nodeBox)), { duration: 250, maxZoom: 1.3, padding: 0.6 });
  };
  const pickProblem = (p: Problem) => {
    showOnCanvas(p.blockId, p.wireId);
    if (p.field === "expr") window.setTimeout(() => firstField.current?.focus(), 50);
  };
  const review = useReviewComments(linkedComment);

  const restoreDraft = () => {
    const offered = draft.offer;
    if (!offered) return;
    // Undoable like any edit; the draft's own base version is kept so a save after someone else's reports the conflict.
    run("Restore draft", () => done(offered.doc));
    setBase(offered.baseVersion);
    draft.closeOffer();
  };

  const statusText = viewOnly
    ? `Read only: version ${base}`
    : readOnly
      ? "Read only: you are a viewer of this team"
      : dirty
        ? `Unsaved changes${base ? ` since v${base}` : ""}${draft.failed ? " (this browser refused to keep a draft)" : " · draft kept in this browser"}`
        : base
          ? `Saved as v${base}`
          : "No version saved yet";
  const saveProblems = useMemo(() => view.problems.filter((p) => p.severity === "error"), [view.problems]);
  const flawed = savedProblems && savedProblems.number === base && !dirty ? savedProblems.count : null;
  const status = (
    <>
      {statusText}
      {flawed !== null && (
        <strong className="font-medium text-fault">
          {" "}
          · v{base} was saved with {counted(flawed, "problem")}
        </strong>
      )}
    </>
  );

  return (
    <EditorContext.Provider value={useMemo(() => ({ act, readOnly }), [act, readOnly])}>
      {!viewOnly && (
        <SessionBanners
          diagram={diagram}
          readOnly={readOnly}
          base={base}
          latestNow={latestNow}
          dirty={dirty}
          draftKept={!draft.failed}
          draft={draft.offer}
          onRestore={restoreDraft}
          onDiscardDraft={() => {
            draft.clear();
            draft.closeOffer();
          }}
          onReload={() => void onReload()}
          onCompare={setComparing}
        />
      )}
      {!readOnly && (
        <ImportVersion
          diagramId={diagram.id}
          teamId={diagram.teamId}
          dirty={dirty}
          onOpenLatest={() => {
            draft.clear();
            guard.allowLeave();
            void onReload();
          }}
        />
      )}
      <EditorToolbar
        readOnly={readOnly}
        undoLabel={history.undoLabel}
        redoLabel={history.redoLabel}
        onUndo={history.undo}
        onRedo={history.redo}
        onLayout={commands.layout}
        layingOut={commands.layingOut}
        onFit={commands.fit}
        onHelp={() => setHelp(true)}
        onSave={save.open}
        download={viewOnly ? undefined : base ? versionExports(diagram.id, base) : null}
        onShare={share && !viewOnly ? () => setSharing(true) : undefined}
        status={status}
      />
      <EditorWorkspace
        rail={readOnly ? undefined : <BlockRail onAdd={commands.addFromRail} />}
        canvas={
          <div ref={canvasBox} className="relative min-w-0">
            <DiagramCanvas
              nodes={canvasState.nodes}
              edges={canvasState.edges}
              onNodesChange={canvasState.onNodesChange}
              onEdgesChange={canvasState.onEdgesChange}
              readOnly={readOnly}
              pointer={pointer}
              onConnectWire={commands.connectWire}
              onDropBlock={commands.dropBlock}
            >
              {step && footprint && <StepBadge step={step} number={(stepAt ?? 0) + 1} footprint={footprint} nodes={canvasState.nodes} doc={doc} />}
              {comments && <CommentPins pins={review.threads.pins} nodes={canvasState.nodes} doc={doc} onOpen={review.openThread} />}
            </DiagramCanvas>
            {doc.blocks.length === 0 && (
              <p className="pointer-events-none absolute inset-x-0 top-1/3 mx-auto max-w-sm text-center text-sm text-ink-soft">
                {readOnly
                  ? "This diagram is empty."
                  : "An empty sheet. Add an input, a summing junction, a transfer function and an output from the rail (keys 1, 2, 4, 7), then wire them."}
              </p>
            )}
            <CanvasNotice notice={notice} onDone={clearNotice} />
          </div>
        }
        side={
          <SidePanel
            tab={review.tab}
            onTab={review.setTab}
            properties={
              <PropertiesPanel
                doc={doc}
                selection={selection}
                firstFieldRef={firstField}
                analysisBreak={{ used: usedBreak, chosen: analysisSettings.break, onBreak: (id) => changeAnalysis({ break: id }) }}
              />
            }
            comments={
              comments && {
                label: `Comments${review.threads.open ? ` (${review.threads.open} open)` : ""}`,
                body: comments({
                  diagramId: diagram.id,
                  version: base,
                  doc: savedDoc,
                  selected: selectedPin(selection),
                  focus: review.focus,
                  onThreads: review.onThreads,
                  onShowPin: (pin) => showOnCanvas("blockId" in pin ? pin.blockId : undefined, "wireId" in pin ? pin.wireId : undefined),
                }),
              }
            }
          />
        }
        results={
          <ResultsColumn
            doc={doc}
            result={{ live, view, stale: live.doc !== doc, onPair: choosePair, atValues: analysis.result && { analysis: analysis.result.analysis, moved: slidersMoved(analysis.result) } }}
            steps={{ steps: view.steps, current: step ? stepAt : null, onChange: setStepAt }}
            problems={live.outcome ? view.problems : null}
            onPickProblem={pickProblem}
            analysis={{ live: analysis, settings: analysisSettings, onSettings: changeAnalysis }}
          />
        }
      />
      <SessionDialogs
        diagram={diagram}
        base={base}
        save={save}
        help={help}
        readOnly={readOnly}
        onCloseHelp={() => setHelp(false)}
        blocker={guard.blocker}
        problems={saveProblems}
        onReload={async () => {
          draft.clear();
          await onReload();
        }}
      />
      {comparing !== null && (
        <Dialog title={`v${comparing} compared with ${dirty ? "your changes" : `v${base}`}`} full onClose={() => setComparing(null)}>
          <CompareWithLocal diagramId={diagram.id} number={comparing} doc={doc} label={dirty ? "Your changes" : `v${base}`} />
        </Dialog>
      )}
      {sharing && share && (
        <Dialog title="Share a read-only link" wide onClose={() => setSharing(false)}>
          {share({ diagramId: diagram.id, openVersion: base })}
        </Dialog>
      )}
    </EditorContext.Provider>
  );
}
