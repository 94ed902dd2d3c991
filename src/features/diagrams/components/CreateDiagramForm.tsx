import { useForm } from "react-hook-form";
import { useNavigate } from "react-router-dom";
import { zodResolver } from "@hookform/resolvers/zod";
import { toast } from "sonner";
import { createDiagramSchema } from "@shared/api/diagrams";
import { href } from "@shared/routes";
import { Button } from "@/components/Button";
import { FormError, TextAreaField, TextField } from "@/components/Field";
import { showServerError } from "@/lib/forms";
import { useCreateDiagram } from "@/features/diagrams/api/createDiagram";

export function CreateDiagramForm({ teamId }: { teamId: string }) {
  const create = useCreateDiagram(teamId);
  const navigate = useNavigate();
  const form = useForm({ resolver: zodResolver(createDiagramSchema), defaultValues: { title: "", description: "" } });
  const { errors, isSubmitting } = form.formState;

  const submit = form.handleSubmit((values) =>
    create.mutateAsync(values).then(
      (d) => {
        toast.success(`Diagram “${d.title}” created.`);
        form.reset();
        // A new diagram is made to be drawn: open it in the editor.
        navigate(href.diagram(d.id));
      },
      (e) => showServerError(e, form.setError, ["title", "description"], "title"),
    ),
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField label="Title" placeholder="e.g. Feedwater level loop" error={errors.title?.message} {...form.register("title")} />
      <TextAreaField
        label="Description (optional)"
        error={errors.description?.message}
        {...form.register("description")}
      />
      <FormError message={errors.root?.server?.message} />
      <Button type="submit" variant="primary" pending={isSubmitting} className="self-start">
        Create diagram
      </Button>
    </form>
  );
}
