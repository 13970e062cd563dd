import bcrypt from 'bcryptjs';
import type { Knex } from 'knex';

/**
 * Demo accounts of an invented packhouse, "Kestrel Vale Packhouse". Demo only: the shared
 * password is printed in the README and must never be used on a real site.
 */
export const DEMO_PASSWORD = 'kestrel-demo-2026';
export const DEMO_USERS = [
  { email: 'admin@kestrelvale.example', name: 'Mara Oduya', role: 'admin' },
  { email: 'editor@kestrelvale.example', name: 'Tomas Reyn', role: 'editor' },
  { email: 'editor2@kestrelvale.example', name: 'Ilse Brandt', role: 'editor' },
  { email: 'engineer@kestrelvale.example', name: 'Priya Lent', role: 'engineer' },
  { email: 'buyer@kestrelvale.example', name: 'Owen Sallow', role: 'buyer' },
] as const;

export async function seed(knex: Knex): Promise<void> {
  const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
  const now = new Date();
  await knex('users')
    .insert(
      DEMO_USERS.map((u) => ({
        ...u,
        password_hash: hash,
        disabled: false,
        created_at: now,
        updated_at: now,
      })),
    )
    .onConflict('email')
    .ignore();
}
