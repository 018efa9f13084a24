import { eq } from 'drizzle-orm';
import type { Executor } from '@/db/client';
import { users, type UserRow } from '@/db/schema';

export async function findUserByEmail(db: Executor, email: string): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.email, email)).limit(1);
  return row;
}

export async function findUserById(db: Executor, id: string): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1);
  return row;
}

export async function insertUser(db: Executor, values: typeof users.$inferInsert): Promise<UserRow> {
  const [row] = await db.insert(users).values(values).returning();
  return row;
}

export async function updateUser(
  db: Executor,
  id: string,
  patch: Partial<Pick<UserRow, 'name' | 'unitSystem' | 'passwordHash'>>,
): Promise<UserRow | undefined> {
  const [row] = await db
    .update(users)
    .set({ ...patch, updatedAt: new Date() })
    .where(eq(users.id, id))
    .returning();
  return row;
}

export async function countUsers(db: Executor): Promise<number> {
  const rows = await db.select({ id: users.id }).from(users).limit(1);
  return rows.length;
}
