import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { signInSchema, type UserView } from "@shared/api/auth";
import { Button } from "@/components/Button";
import { FormError, TextField } from "@/components/Field";
import { showServerError } from "@/lib/forms";
import { useSignIn } from "@/features/auth/api/signIn";
import { DemoAccounts } from "@/features/auth/components/DemoAccounts";

export function SignInForm({ onSignedIn }: { onSignedIn: (user: UserView) => void }) {
  const signIn = useSignIn();
  const form = useForm({ resolver: zodResolver(signInSchema), defaultValues: { email: "", password: "" } });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) =>
    signIn.mutateAsync(values).then(onSignedIn, (e) => showServerError(e, form.setError, ["email", "password"])),
  );

  return (
    <div className="flex flex-col gap-6">
      <form onSubmit={submit} noValidate className="flex flex-col gap-4">
        <TextField label="E-mail" type="email" autoComplete="username" error={errors.email?.message} {...form.register("email")} />
        <TextField
          label="Password"
          type="password"
          autoComplete="current-password"
          error={errors.password?.message}
          {...form.register("password")}
        />
        <FormError message={errors.root?.server?.message} />
        <Button type="submit" variant="primary" pending={form.formState.isSubmitting}>
          Sign in
        </Button>
      </form>
      <DemoAccounts
        onPick={(email, password) => {
          form.setValue("email", email, { shouldValidate: true });
          form.setValue("password", password, { shouldValidate: true });
        }}
      />
    </div>
  );
}
