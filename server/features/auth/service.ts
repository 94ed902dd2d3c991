import { generateIdFromEntropySize } from "lucia";
import { UniqueConstraintError } from "sequelize";
import type { SignInInput, SignUpInput, UserView } from "@shared/api/auth";
import { dummyHash, hashPassword, verifyPassword } from "@server/auth/password";
import { User } from "@server/db/models/user";
import { HttpError, conflict } from "@server/http/errors";

export const userView = (u: { id: string; email: string; name: string }): UserView => ({ id: u.id, email: u.email, name: u.name });

/** Creates an account; a taken e-mail is a 409. */
export async function signUp(input: SignUpInput): Promise<UserView> {
  try {
    const user = await User.create({
      id: generateIdFromEntropySize(10),
      email: input.email,
      name: input.name,
      passwordHash: await hashPassword(input.password),
    });
    return userView(user);
  } catch (e) {
    if (e instanceof UniqueConstraintError) throw conflict("An account with this e-mail already exists. Sign in instead.");
    throw e;
  }
}

/** Checks the credentials; the same answer (and about the same time) for an unknown e-mail and a wrong password. */
export async function signIn(input: SignInInput): Promise<UserView> {
  const user = await User.findOne({ where: { email: input.email } });
  const ok = await verifyPassword(user?.passwordHash ?? (await dummyHash), input.password);
  if (!user || !ok) throw new HttpError(401, "bad_credentials", "E-mail or password is wrong.");
  return userView(user);
}
