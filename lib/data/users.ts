import "server-only";
import { getDb } from "@/models";
import { DUMMY_HASH, verifyPassword } from "@/lib/auth/password";
import type { UserDto } from "@/lib/dto/people";

const toUserDto = (u: { id: number; email: string; name: string }): UserDto => ({
  id: u.id,
  email: u.email,
  name: u.name,
});

const normalise = (email: string) => email.trim().toLowerCase();

/** Null for an unknown e-mail and for a wrong password alike (and in about the same time). */
export async function authenticate({ email, password }: { email: string; password: string }): Promise<UserDto | null> {
  const { User } = getDb();
  const user = await User.findOne({ where: { email: normalise(email) } });
  const ok = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !ok) return null;
  return toUserDto(user);
}

export async function getUserByEmail(email: string): Promise<UserDto | null> {
  const user = await getDb().User.findOne({ where: { email: normalise(email) } });
  return user ? toUserDto(user) : null;
}
