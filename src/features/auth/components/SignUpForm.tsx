import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { signUpSchema, type UserView } from "@shared/api/auth";
import { Button } from "@/components/Button";
import { FormError, TextField } from "@/components/Field";
import { showServerError } from "@/lib/forms";
import { useSignUp } from "@/features/auth/api/signUp";

interface Props {
  onSignedUp: (user: UserView) => Promise<unknown> | void;
  /** An invitation fixes the e-mail: it is shown read-only. */
  lockedEmail?: string;
  submitLabel?: string;
}

export function SignUpForm({ onSignedUp, lockedEmail, submitLabel = "Create account" }: Props) {
  const signUp = useSignUp();
  const form = useForm({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: "", email: lockedEmail ?? "", password: "" },
  });
  const { errors, isSubmitting } = form.formState;

  const submit = form.handleSubmit(async (values) => {
    let user: UserView;
    try {
      user = await signUp.mutateAsync(values);
    } catch (e) {
      return showServerError(e, form.setError, ["name", "email", "password"], "email");
    }
    await onSignedUp(user);
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField label="Name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        readOnly={lockedEmail !== undefined}
        hint={lockedEmail !== undefined ? "The invitation was sent to this address." : undefined}
        error={errors.email?.message}
        {...form.register("email")}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...form.register("password")}
      />
      <FormError message={errors.root?.server?.message} />
      <Button type="submit" variant="primary" pending={isSubmitting}>
        {submitLabel}
      </Button>
    </form>
  );
}
