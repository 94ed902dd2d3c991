import { useState } from "react";
import { Button } from "@/components/Button";
import { JsonFilePicker } from "@/components/JsonFilePicker";
import { errorMessage, isApiError } from "@/lib/apiClient";
import { useImportVersion } from "@/features/editor/api/importVersion";
import { ProblemAlert } from "@/components/ProblemAlert";

interface Props {
  diagramId: string;
  teamId: string;
  /** Unsaved edits in the open session: opening the imported version would drop them, so the user is asked first. */
  dirty: boolean;
  /** Opens the diagram's latest version in a fresh session. */
  onOpenLatest: () => void;
}

/**
 * "Import as new version…": a .json file becomes the diagram's next version on the server. The open session is
 * left as it is; the new version is offered, and the server's refusal (with the problems it found) shown.
 */
export function ImportVersion({ diagramId, teamId, dirty, onOpenLatest }: Props) {
  const importing = useImportVersion(diagramId, teamId);
  const [refusal, setRefusal] = useState<{ message: string; problems: string[] } | null>(null);
  const [imported, setImported] = useState<number | null>(null);

  const start = (file: File) => {
    setRefusal(null);
    setImported(null);
    importing.mutate(file, {
      onSuccess: (v) => setImported(v.number),
      onError: (e) => setRefusal({ message: errorMessage(e), problems: isApiError(e) ? e.problems.map((p) => p.message) : [] }),
    });
  };

  const open = () => {
    if (dirty && !window.confirm("Open the imported version? Your unsaved changes in this editor will be lost.")) return;
    onOpenLatest();
  };

  return (
    <div className="mb-2 flex flex-col gap-2 text-sm">
      <div className="flex flex-wrap items-center gap-3">
        <JsonFilePicker disabled={importing.isPending} onFile={start}>
          Import as new version…
        </JsonFilePicker>
        <span role="status" className="text-ink-soft">
          {importing.isPending ? "Importing…" : imported !== null ? `Imported as version ${imported}.` : ""}
        </span>
        {imported !== null && (
          <Button size="sm" onClick={open}>
            Open version {imported}
          </Button>
        )}
      </div>
      {refusal && <ProblemAlert title={`The file was not imported as a new version: ${refusal.message}`} problems={refusal.problems} />}
    </div>
  );
}
