import 'server-only';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { recordAudit } from '@/lib/audit-trail';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '@/lib/errors';
import { decodeImport, lineErrors, parseValueCsv } from '@/lib/validation/import-csv';
import { asStage, type Quantity } from '@/lib/properties/quantities';
import { getUnitSystem } from './users';
import { valueRow } from './value-row';

/** A revision holds at most this many values (draftUpdateSchema's limit, so it stays editable). */
const MAX_VALUES = 200;
const EDITABLE = ['draft', 'returned'] as const;

/**
 * Append the values of a CSV file to a draft, all or nothing: every row is checked first (see
 * lib/properties/import-csv.ts) and one transaction adds them after the draft's values. The same
 * rules as editing a draft: only its author, only while it is a draft or returned.
 */
export async function importDraftValues(actor: Actor, id: number, bytes: Uint8Array) {
  assertCan(actor, 'revisions:edit');
  const decoded = decodeImport(bytes);
  if ('error' in decoded)
    throw new ValidationError(decoded.error.message, lineErrors([decoded.error]));
  const system = await getUnitSystem(actor);
  return db.transaction(async (trx) => {
    const row = await typed(trx)
      .selectFrom('property_revisions')
      .select(['id', 'number', 'status', 'author_id'])
      .where('id', '=', id)
      .executeTakeFirst();
    if (!row) throw new NotFoundError('No such revision.');
    if (row.author_id !== actor.id)
      throw new ForbiddenError('Only the author of a draft may change, submit or rebase it.');
    if (!(EDITABLE as readonly string[]).includes(row.status))
      throw new ConflictError(
        `Revision ${row.number} is ${row.status.replace('_', ' ')}; only a draft or a returned revision can be edited.`,
      );
    const sources = await typed(trx).selectFrom('sources').select(['id', 'key']).execute();
    const sourceId = new Map(sources.map((s) => [s.key, s.id]));
    const held = await typed(trx)
      .selectFrom('revision_values as v')
      .leftJoin('sources as s', 's.id', 'v.source_id')
      .select(['v.quantity', 'v.variant', 'v.value', 'v.stage', 'v.position', 's.key'])
      .where('v.revision_id', '=', id)
      .execute();
    const existing = held.map((v) => ({
      quantity: v.quantity as Quantity,
      variant: v.variant,
      value: Number(v.value),
      sourceKey: v.key ?? null,
      stage: asStage(v.stage),
    }));
    const { values, errors } = parseValueCsv(decoded.text, {
      system,
      sourceKeys: new Set(sourceId.keys()),
      existing,
    });
    if (errors.length) {
      const rows = new Set(errors.map((e) => e.line)).size;
      throw new ValidationError(
        `${rows === 1 ? 'One line has' : `${rows} lines have`} errors; nothing was imported.`,
        lineErrors(errors),
      );
    }
    const total = existing.length + values.length;
    if (total > MAX_VALUES) {
      const message = `The draft holds ${existing.length} values; ${values.length} more would make ${total}, and a revision holds at most ${MAX_VALUES}. Nothing was imported.`;
      throw new ValidationError(message, { file: [message] });
    }
    const next = Math.max(-1, ...held.map((v) => Number(v.position))) + 1;
    const touched = await trx('property_revisions')
      .where({ id })
      .whereIn('status', EDITABLE)
      .update({ updated_at: new Date() });
    if (touched !== 1) throw new ConflictError('The draft changed while the file was read.');
    await trx('revision_values').insert(
      values.map((v, i) =>
        valueRow(v, id, next + i, v.sourceKey ? sourceId.get(v.sourceKey)! : null),
      ),
    );
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'revision.import',
      entity: 'revision',
      entityId: id,
      detail: { imported: values.length, values: total },
    });
    return { id, imported: values.length, values: total };
  });
}
