import { z } from "zod";

/** Sign-up, sign-in and invitation-acceptance forms; used by the client forms and the server edge. */
export const emailSchema = z.string().trim().toLowerCase().pipe(z.email("Enter a valid e-mail address"));
export const passwordSchema = z
  .string()
  .min(10, "Use at least 10 characters")
  .max(200, "Use at most 200 characters");

export const signUpSchema = z.object({
  name: z.string().trim().min(1, "Enter your name").max(100, "Use at most 100 characters"),
  email: emailSchema,
  password: passwordSchema,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password").max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

export interface UserView {
  id: string;
  email: string;
  name: string;
}
