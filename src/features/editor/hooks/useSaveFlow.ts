import { useState } from "react";
import { useNavigate } from "react-router-dom";
import { useQueryClient } from "@tanstack/react-query";
import { toast } from "sonner";
import type { DiagramDetail, DiagramVersionView, LatestVersionView } from "@shared/api/diagrams";
import { editorDiagramQuery } from "@/features/editor/api/getEditorDiagram";
import { useSaveAsNewDiagram } from "@/features/editor/api/saveAsNewDiagram";
import { useSaveVersion } from "@/features/editor/api/saveVersion";
import type { EditorDoc } from "@/features/editor/commands/types";
import { errorMessage, isApiError } from "@/lib/apiClient";
import { href } from "@shared/routes";

type Dialog =
  | { kind: "save" }
  | { kind: "conflict"; message: string; latest: LatestVersionView | null; versionMessage: string };

interface Args {
  diagram: DiagramDetail["diagram"];
  doc: EditorDoc;
  baseVersion: number;
  /** The save went through: `doc` is now version `v`. */
  onSaved: (v: DiagramVersionView, doc: EditorDoc) => void;
  /** Work continues elsewhere (a new diagram): drafts of this one can go and the guard must let us leave. */
  onLeaving: () => void;
}

/** Save version → 201, or 409 → the conflict dialog with its two ways out; nothing is overwritten silently. */
export function useSaveFlow({ diagram, doc, baseVersion, onSaved, onLeaving }: Args) {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const save = useSaveVersion(diagram.id, diagram.teamId);
  const saveAs = useSaveAsNewDiagram();
  const [dialog, setDialog] = useState<Dialog | null>(null);
  const [error, setError] = useState<string>();

  const open = () => {
    setError(undefined);
    setDialog({ kind: "save" });
  };
  const close = () => setDialog(null);

  const submit = (message: string) => {
    const sent = doc;
    setError(undefined);
    save.mutate(
      { baseVersion, message, document: sent },
      {
        onSuccess: (v) => {
          onSaved(v, sent);
          setDialog(null);
          toast.success(`Saved version ${v.number}.`);
        },
        onError: async (e) => {
          if (!isApiError(e, 409)) return setError(errorMessage(e));
          const fresh = await queryClient.fetchQuery({ ...editorDiagramQuery(diagram.id), staleTime: 0 }).catch(() => null);
          setDialog({ kind: "conflict", message: e.message, latest: fresh?.latestVersion ?? null, versionMessage: message });
        },
      },
    );
  };

  const saveAsNew = (title: string) => {
    if (dialog?.kind !== "conflict") return;
    setError(undefined);
    saveAs.mutate(
      { teamId: diagram.teamId, title, description: diagram.description, message: dialog.versionMessage, document: doc },
      {
        onSuccess: (d) => {
          onLeaving();
          setDialog(null);
          toast.success(`Saved your work as “${d.title}”.`);
          navigate(href.diagram(d.id));
        },
        onError: (e) => setError(errorMessage(e)),
      },
    );
  };

  return { dialog, error, open, close, submit, saveAsNew, saving: save.isPending, savingAs: saveAs.isPending };
}
