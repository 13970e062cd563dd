import type { Knex } from 'knex';

/**
 * The squeeze model's mesh levels take names of our own: coarse → sparse, normal → balanced,
 * fine → dense. Saved assessments keep their inputs (re-runs send them again) and results, so
 * the level in each is renamed where it is written: the inputs' `mesh`, and the result's
 * `model.input.level`, `model.mesh.level` and `model.grip_mesh.level`. Row by row in JSON, the
 * same on SQLite and PostgreSQL; down renames back.
 */
const UP: Record<string, string> = { coarse: 'sparse', normal: 'balanced', fine: 'dense' };
const DOWN: Record<string, string> = Object.fromEntries(Object.entries(UP).map(([a, b]) => [b, a]));

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null;

function renameLevel(holder: unknown, key: string, names: Record<string, string>): boolean {
  if (!isObject(holder) || typeof holder[key] !== 'string' || !names[holder[key] as string])
    return false;
  holder[key] = names[holder[key] as string];
  return true;
}

async function rename(knex: Knex, names: Record<string, string>): Promise<void> {
  const rows: { id: number; inputs: string; results: string }[] = await knex('assessments').select(
    'id',
    'inputs',
    'results',
  );
  for (const row of rows) {
    const inputs = JSON.parse(row.inputs) as unknown;
    const results = JSON.parse(row.results) as unknown;
    const model = isObject(results) ? results.model : null;
    const changed = [
      renameLevel(inputs, 'mesh', names),
      renameLevel(isObject(model) ? model.input : null, 'level', names),
      renameLevel(isObject(model) ? model.mesh : null, 'level', names),
      renameLevel(isObject(model) ? model.grip_mesh : null, 'level', names),
    ].some(Boolean);
    if (changed)
      await knex('assessments')
        .where({ id: row.id })
        .update({ inputs: JSON.stringify(inputs), results: JSON.stringify(results) });
  }
}

export async function up(knex: Knex): Promise<void> {
  await rename(knex, UP);
}

export async function down(knex: Knex): Promise<void> {
  await rename(knex, DOWN);
}
