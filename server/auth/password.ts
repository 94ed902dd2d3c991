import { hash, verify } from "@node-rs/argon2";

// argon2id with the OWASP minimum profile (19 MiB, 2 passes, 1 lane): ~47 ms a hash on these machines.
const options = { memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

export const hashPassword = (password: string): Promise<string> => hash(password, options);

export const verifyPassword = (stored: string, password: string): Promise<boolean> =>
  verify(stored, password).catch(() => false);

/** A valid hash of nothing anyone types, so an unknown e-mail costs the same time as a wrong password. */
export const dummyHash = hashPassword("loopwright-timing-equaliser-never-a-password");
