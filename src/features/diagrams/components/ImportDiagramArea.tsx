import { useState, type DragEvent, type ReactNode } from "react";
import { useNavigate } from "react-router-dom";
import { toast } from "sonner";
import { href } from "@shared/routes";
import { JsonFilePicker } from "@/components/JsonFilePicker";
import { errorMessage, isApiError } from "@/lib/apiClient";
import { useImportDiagram } from "@/features/diagrams/api/importDiagram";
import { ProblemAlert } from "@/components/ProblemAlert";

const hasFiles = (e: DragEvent) => e.dataTransfer.types.includes("Files");

/**
 * The diagram list with an "Import JSON" picker above it; a .json file dropped on the list imports too.
 * The new diagram opens; the server's refusal (with the problems it found) is shown as an alert.
 */
export function ImportDiagramArea({ teamId, children }: { teamId: string; children: ReactNode }) {
  const navigate = useNavigate();
  const importing = useImportDiagram(teamId);
  const [refusal, setRefusal] = useState<{ message: string; problems: string[] } | null>(null);
  const [over, setOver] = useState(false);

  const start = (file: File) => {
    setRefusal(null);
    if (!file.name.toLowerCase().endsWith(".json"))
      return setRefusal({ message: `Only .json diagram files can be imported; “${file.name}” is not one.`, problems: [] });
    importing.mutate(file, {
      onSuccess: (d) => {
        toast.success(`Diagram “${d.title}” imported.`);
        void navigate(href.diagram(d.id));
      },
      onError: (e) => setRefusal({ message: errorMessage(e), problems: isApiError(e) ? e.problems.map((p) => p.message) : [] }),
    });
  };

  const dragOver = (e: DragEvent) => {
    if (!hasFiles(e)) return;
    e.preventDefault(); // lets the drop happen
    setOver(true);
  };

  const drop = (e: DragEvent) => {
    if (!hasFiles(e)) return;
    e.preventDefault();
    setOver(false);
    const file = e.dataTransfer.files[0];
    if (file) start(file);
  };

  return (
    <div
      onDragOver={dragOver}
      onDragLeave={() => setOver(false)}
      onDrop={drop}
      className={`flex flex-col gap-3 rounded ${over ? "outline-2 outline-dashed outline-signal" : ""}`}
    >
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <JsonFilePicker disabled={importing.isPending} onFile={start}>
          Import JSON
        </JsonFilePicker>
        <span className="text-ink-soft" role="status">
          {importing.isPending ? "Importing…" : "or drop a .json diagram file on the list"}
        </span>
      </div>
      {refusal && <ProblemAlert title={`The file was not imported: ${refusal.message}`} problems={refusal.problems} />}
      {children}
    </div>
  );
}
