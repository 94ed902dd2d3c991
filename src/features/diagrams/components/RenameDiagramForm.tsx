import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { toast } from "sonner";
import { updateDiagramSchema, type DiagramSummary } from "@shared/api/diagrams";
import { Button } from "@/components/Button";
import { FormError, TextField } from "@/components/Field";
import { showServerError } from "@/lib/forms";
import { useUpdateDiagram } from "@/features/diagrams/api/updateDiagram";

/** Inline rename inside the diagram's table row; Escape cancels. */
export function RenameDiagramForm({ diagram, onDone }: { diagram: DiagramSummary; onDone: () => void }) {
  const update = useUpdateDiagram();
  const form = useForm({ resolver: zodResolver(updateDiagramSchema), defaultValues: { title: diagram.title } });
  const { errors, isSubmitting } = form.formState;

  const submit = form.handleSubmit((values) =>
    update.mutateAsync({ id: diagram.id, input: { title: values.title } }).then(
      (d) => {
        toast.success(`Renamed to “${d.title}”.`);
        onDone();
      },
      (e) => showServerError(e, form.setError, ["title"], "title"),
    ),
  );

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Rename ${diagram.title}`}
      onKeyDown={(e) => e.key === "Escape" && onDone()}
      className="flex flex-col gap-2"
    >
      <TextField label="New title" autoFocus error={errors.title?.message} {...form.register("title")} />
      <FormError message={errors.root?.server?.message} />
      <div className="flex gap-2">
        <Button type="submit" size="sm" variant="primary" pending={isSubmitting}>
          Save title
        </Button>
        <Button size="sm" variant="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
