import { useState } from "react";
import type { Blocker } from "react-router-dom";
import type { DiagramDetail } from "@shared/api/diagrams";
import type { Problem } from "@shared/diagram/problems";
import { ConflictDialog } from "@/features/editor/components/dialogs/ConflictDialog";
import { HelpDialog } from "@/features/editor/components/dialogs/HelpDialog";
import { LeaveDialog } from "@/features/editor/components/dialogs/LeaveDialog";
import { SaveDialog } from "@/features/editor/components/dialogs/SaveDialog";
import type { useSaveFlow } from "@/features/editor/hooks/useSaveFlow";

interface Props {
  diagram: DiagramDetail["diagram"];
  base: number;
  save: ReturnType<typeof useSaveFlow>;
  help: boolean;
  readOnly: boolean;
  onCloseHelp: () => void;
  blocker: Blocker;
  onReload: () => Promise<void>;
  /** Errors of the document as the live check sees it now. */
  problems: Problem[];
}

/** The editor's modal questions, one at a time. */
export function SessionDialogs({ diagram, base, save, help, readOnly, onCloseHelp, blocker, onReload, problems }: Props) {
  const [reloading, setReloading] = useState(false);
  const d = save.dialog;
  return (
    <>
      {d?.kind === "save" && (
        <SaveDialog nextNumber={base + 1} pending={save.saving} error={save.error} problems={problems} onSave={save.submit} onClose={save.close} />
      )}
      {d?.kind === "conflict" && (
        <ConflictDialog
          message={d.message}
          baseVersion={base}
          latest={d.latest}
          defaultTitle={`${diagram.title} (my version)`.slice(0, 120)}
          pending={save.savingAs || reloading}
          error={save.error}
          onReload={() => {
            setReloading(true);
            void onReload().finally(() => setReloading(false));
          }}
          onSaveAsNew={save.saveAsNew}
          onClose={save.close}
        />
      )}
      {help && <HelpDialog readOnly={readOnly} onClose={onCloseHelp} />}
      {blocker.state === "blocked" && <LeaveDialog onStay={() => blocker.reset()} onLeave={() => blocker.proceed()} />}
    </>
  );
}
