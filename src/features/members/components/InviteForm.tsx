import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { toast } from "sonner";
import { inviteSchema, roles } from "@shared/api/teams";
import { Button } from "@/components/Button";
import { FormError, SelectField, TextField } from "@/components/Field";
import { showServerError } from "@/lib/forms";
import { roleLabel } from "@/lib/format";
import { useCreateInvitation } from "@/features/members/api/createInvitation";

export function InviteForm({ teamId }: { teamId: string }) {
  const invite = useCreateInvitation(teamId);
  const form = useForm({ resolver: zodResolver(inviteSchema), defaultValues: { email: "", role: "viewer" as const } });
  const { errors, isSubmitting } = form.formState;

  const submit = form.handleSubmit((values) =>
    invite.mutateAsync(values).then(
      (inv) => {
        toast.success(`Invitation sent to ${inv.email}.`);
        form.reset({ email: "", role: values.role });
      },
      (e) => showServerError(e, form.setError, ["email", "role"], "email"),
    ),
  );

  return (
    <form onSubmit={submit} noValidate className="grid gap-4 sm:grid-cols-[1fr_12rem_auto] sm:items-start">
      <TextField label="Colleague's e-mail" type="email" autoComplete="off" error={errors.email?.message} {...form.register("email")} />
      <SelectField label="Role" error={errors.role?.message} {...form.register("role")}>
        {roles.map((r) => (
          <option key={r} value={r}>
            {roleLabel(r)}
          </option>
        ))}
      </SelectField>
      <Button type="submit" variant="primary" pending={isSubmitting} className="sm:mt-6">
        Send invitation
      </Button>
      <div className="sm:col-span-3">
        <FormError message={errors.root?.server?.message} />
      </div>
    </form>
  );
}
