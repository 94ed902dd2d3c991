import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { toast } from "sonner";
import { createTeamSchema, type TeamView } from "@shared/api/teams";
import { Button } from "@/components/Button";
import { FormError, TextField } from "@/components/Field";
import { showServerError } from "@/lib/forms";
import { useCreateTeam } from "@/features/teams/api/createTeam";

export function CreateTeamForm({ onCreated }: { onCreated: (team: TeamView) => void }) {
  const createTeam = useCreateTeam();
  const form = useForm({ resolver: zodResolver(createTeamSchema), defaultValues: { name: "" } });
  const { errors, isSubmitting } = form.formState;

  const submit = form.handleSubmit((values) =>
    createTeam.mutateAsync(values).then(
      (team) => {
        toast.success(`Team “${team.name}” created.`);
        form.reset();
        onCreated(team);
      },
      (e) => showServerError(e, form.setError, ["name"], "name"),
    ),
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField label="Team name" placeholder="e.g. Boiler feed controls" error={errors.name?.message} {...form.register("name")} />
      <FormError message={errors.root?.server?.message} />
      <Button type="submit" variant="primary" pending={isSubmitting} className="self-start">
        Create team
      </Button>
    </form>
  );
}
