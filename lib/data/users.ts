import "server-only";
import { UniqueConstraintError } from "sequelize";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";
import { DUMMY_HASH, hashPassword, verifyPassword } from "@/lib/auth/password";

export type UserDto = { id: number; email: string; name: string };

const normalise = (email: string) => email.trim().toLowerCase();

/** Null for an unknown e-mail and for a wrong password alike (and in about the same time). */
export async function authenticate({ email, password }: { email: string; password: string }): Promise<UserDto | null> {
  const { User } = getDb();
  const user = await User.findOne({ where: { email: normalise(email) } });
  const ok = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !ok) return null;
  return { id: user.id, email: user.email, name: user.name };
}

export async function createUser({ email, name, password }: { email: string; name: string; password: string }): Promise<UserDto> {
  const { User } = getDb();
  try {
    const user = await User.create({ email: normalise(email), name: name.trim(), passwordHash: await hashPassword(password) });
    return { id: user.id, email: user.email, name: user.name };
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      throw new AppError("conflict", "An account with that e-mail already exists. Sign in instead.", {
        fieldErrors: { email: ["already registered"] },
      });
    }
    throw err;
  }
}

export async function getUserByEmail(email: string): Promise<UserDto | null> {
  const user = await getDb().User.findOne({ where: { email: normalise(email) } });
  return user ? { id: user.id, email: user.email, name: user.name } : null;
}
