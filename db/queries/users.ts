import "server-only";
import { asc, eq } from "drizzle-orm";
import bcrypt from "bcryptjs";
import { db } from "@/db/client";
import { users, type User } from "@/db/schema";
import { AppError } from "@/lib/server/errors";
import { revokeSessionsOfUser } from "./sessions";
import type { NewUserInput, UpdateUserInput } from "@/lib/validation/users";

export type PublicUser = Omit<User, "passwordHash">;

const publicColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  disabled: users.disabled,
  createdAt: users.createdAt,
  updatedAt: users.updatedAt,
};

export async function getUserByEmail({ email }: { email: string }): Promise<User | undefined> {
  const rows = await db.select().from(users).where(eq(users.email, email.trim().toLowerCase())).limit(1);
  return rows[0];
}

export async function getUserById({ id }: { id: string }): Promise<PublicUser | undefined> {
  const rows = await db.select(publicColumns).from(users).where(eq(users.id, id)).limit(1);
  return rows[0];
}

export async function listUsers(): Promise<PublicUser[]> {
  return db.select(publicColumns).from(users).orderBy(asc(users.name));
}

// bcrypt cost 10: ~60 ms per hash here, enough against guessing without slowing sign-in.
export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, 10);
}

export async function createUser({ input }: { input: NewUserInput }): Promise<PublicUser> {
  const email = input.email.trim().toLowerCase();
  const passwordHash = await hashPassword(input.password);
  const inserted = await db
    .insert(users)
    .values({ email, name: input.name.trim(), role: input.role, passwordHash })
    .onConflictDoNothing({ target: users.email })
    .returning(publicColumns);
  const row = inserted[0];
  if (!row) {
    throw new AppError("invalid", `A user with the e-mail ${email} already exists.`, {
      email: [`A user with the e-mail ${email} already exists.`],
    });
  }
  return row;
}

export async function updateUser({ id, input, actingUserId }: { id: string; input: UpdateUserInput; actingUserId: string }): Promise<PublicUser> {
  return db.transaction(async (tx) => {
    const [current] = await tx.select().from(users).where(eq(users.id, id)).for("update");
    if (!current) throw new AppError("not_found", "No such user.");
    const nextRole = input.role ?? current.role;
    const nextDisabled = input.disabled ?? current.disabled;
    if (id === actingUserId && (nextRole !== "admin" || nextDisabled)) {
      throw new AppError("conflict", "You cannot take away your own administrator access; ask another administrator.");
    }
    const [row] = await tx
      .update(users)
      .set({ role: nextRole, disabled: nextDisabled, name: input.name?.trim() ?? current.name, updatedAt: new Date() })
      .where(eq(users.id, id))
      .returning(publicColumns);
    // A disabled account, or one whose role changed, is signed out everywhere at once.
    if (nextDisabled !== current.disabled || nextRole !== current.role) await revokeSessionsOfUser({ userId: id, tx });
    return row!;
  });
}
