import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { actionHeaders, signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { startTestCatcher } from '../support/mail';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import type { Role } from '@/lib/auth/roles';
import { getActiveActor } from '@/lib/data/users';
import { getRevision } from '@/lib/data/cultivars';
import {
  createDraft,
  publishRevision,
  rebaseDraft,
  submitDraft,
  updateDraft,
} from '@/lib/data/revisions';
import { listConflicts } from '@/lib/data/revision-conflicts';
import { initialActionState } from '@/lib/actions/initial-state';
import {
  createDraftAction,
  createSourceAction,
  publishRevisionAction,
  rebaseDraftAction,
  resolveConflictAction,
  returnRevisionAction,
  updateDraftAction,
} from '@/lib/actions/revisions';

type Who = Role | 'signed-out';
const SLUG = 'apple-jonathan';
const SAME_SITE = { origin: 'http://tenderline.test' };
const actors = {} as Record<Role | 'editor2', Actor>;

const form = (values: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(values)) f.append(k, v);
  return f;
};

const withId = (f: FormData, id: number) => (f.set('revisionId', String(id)), f);

/** A server action's outcome as a status; a redirect (Next's control flow) counts as 303. */
async function statusOf(run: Promise<{ status: number }>): Promise<number> {
  try {
    return (await run).status;
  } catch (error) {
    if (String((error as { digest?: string }).digest).startsWith('NEXT_REDIRECT')) return 303;
    throw error;
  }
}

/** Jonathan flesh modulus from the seeded source, as form fields of row `i`. */
const modulusFields = (i: number, value: string) => ({
  [`values.${i}.quantity`]: 'youngs_modulus',
  [`values.${i}.variant`]: 'flesh',
  [`values.${i}.value`]: value,
  [`values.${i}.sourceKey`]: 'shahabasi-1979',
});
const modulus = (value: number) => ({
  quantity: 'youngs_modulus',
  variant: 'flesh',
  value,
  sourceKey: 'shahabasi-1979',
});

/** A draft of another editor (editor2), submitted, so the actor is not its author. */
async function othersInReview(value = 2.61) {
  const { id } = await createDraft(actors.editor2, SLUG);
  await updateDraft(actors.editor2, id, { values: [modulus(value)] });
  await submitDraft(actors.editor2, id);
  return id;
}

/** A draft whose author is the signed-in role when it may draft, else editor@'s. */
async function draftFor(who: Who) {
  const author = who === 'admin' || who === 'editor' ? actors[who] : actors.editor;
  return (await createDraft(author, SLUG)).id;
}

/**
 * A draft of the actor's (editor@'s for roles that may not draft) holding one conflict: it
 * changes the modulus, and editor2's different change (a new figure each time, so it differs
 * from the base too) is published before it is rebased.
 */
let published = 0;
async function conflictFor(who: Who) {
  const author = who === 'admin' || who === 'editor' ? actors[who] : actors.editor;
  const { id } = await createDraft(author, SLUG);
  await updateDraft(author, id, { values: [modulus(4.1)] });
  await publishRevision(
    actors.admin.id === author.id ? actors.editor : actors.admin,
    await othersInReview(4.2 + ++published / 100),
  );
  await rebaseDraft(author, id);
  const [conflict] = await listConflicts(author, id);
  return { revisionId: String(id), conflictId: String(conflict.id) };
}

let sourceCount = 0;
/** A new source's form fields, with a key not used before. */
const sourceFields = () => ({
  key: `packhouse-trial-notes-${++sourceCount}`,
  kind: 'report',
  title: 'Packhouse bruise trial notes',
  authors: 'Quality lab',
  year: '2026',
});

interface Row {
  name: string;
  expect: Record<Who, number>;
  call: (who: Who) => Promise<number>;
}

/**
 * Each revision action and the status each identity must get, written out by hand: drafting and
 * reviewing are for editors and admins; engineers and buyers are refused; signed-out is 401.
 */
const ACTIONS: Row[] = [
  {
    name: 'createDraftAction',
    expect: { 'signed-out': 401, buyer: 403, engineer: 403, editor: 303, admin: 303 },
    call: () => statusOf(createDraftAction(initialActionState, form({ cultivar: SLUG }))),
  },
  {
    name: 'updateDraftAction',
    expect: { 'signed-out': 401, buyer: 403, engineer: 403, editor: 200, admin: 200 },
    call: async (who) =>
      statusOf(
        updateDraftAction(
          initialActionState,
          form({ revisionId: String(await draftFor(who)), ...modulusFields(0, '2.6') }),
        ),
      ),
  },
  {
    name: 'updateDraftAction with intent=submit',
    expect: { 'signed-out': 401, buyer: 403, engineer: 403, editor: 200, admin: 200 },
    call: async (who) =>
      statusOf(
        updateDraftAction(
          initialActionState,
          form({
            revisionId: String(await draftFor(who)),
            intent: 'submit',
            ...modulusFields(0, '2.6'),
          }),
        ),
      ),
  },
  {
    name: 'rebaseDraftAction',
    expect: { 'signed-out': 401, buyer: 403, engineer: 403, editor: 200, admin: 200 },
    call: async (who) =>
      statusOf(
        rebaseDraftAction(initialActionState, form({ revisionId: String(await draftFor(who)) })),
      ),
  },
  {
    name: 'publishRevisionAction',
    expect: { 'signed-out': 401, buyer: 403, engineer: 403, editor: 200, admin: 200 },
    call: async () =>
      statusOf(
        publishRevisionAction(
          initialActionState,
          form({ revisionId: String(await othersInReview()) }),
        ),
      ),
  },
  {
    name: 'returnRevisionAction',
    expect: { 'signed-out': 401, buyer: 403, engineer: 403, editor: 200, admin: 200 },
    call: async () =>
      statusOf(
        returnRevisionAction(
          initialActionState,
          form({ revisionId: String(await othersInReview()), comment: 'Give the storage date.' }),
        ),
      ),
  },
  {
    name: 'resolveConflictAction',
    expect: { 'signed-out': 401, buyer: 403, engineer: 403, editor: 200, admin: 200 },
    call: async (who) =>
      statusOf(
        resolveConflictAction(
          initialActionState,
          form({ ...(await conflictFor(who)), choice: 'theirs' }),
        ),
      ),
  },
  {
    name: 'createSourceAction',
    expect: { 'signed-out': 401, buyer: 403, engineer: 403, editor: 200, admin: 200 },
    call: async (who) =>
      statusOf(
        createSourceAction(
          initialActionState,
          form({ revisionId: String(await draftFor(who)), ...sourceFields() }),
        ),
      ),
  },
];

const WRITTEN = [
  'property_revisions',
  'revision_values',
  'revision_conflicts',
  'sources',
  'audit_log',
];
const snapshot = () => Promise.all(WRITTEN.map((t) => countRows(t)));
const storedValues = async (id: number) =>
  (await getRevision(actors.editor, id)).values.map((v) => ({
    quantity: v.quantity,
    variant: v.variant,
    value: v.value,
    low: v.low,
    high: v.high,
    source: v.source?.key ?? null,
  }));

describe('revision server actions', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
    const actor = async (email: string) => (await getActiveActor(await userId(email)))!;
    for (const role of ['admin', 'editor', 'engineer', 'buyer'] as const)
      actors[role] = await actor(ACCOUNTS[role]);
    actors.editor2 = await actor('editor2@kestrelvale.example');
  });
  afterAll(() => catcher.close());
  beforeEach(() => actionHeaders(SAME_SITE));

  describe('role table', () => {
    for (const row of ACTIONS) {
      for (const who of Object.keys(row.expect) as Who[]) {
        it(`${row.name} as ${who} → ${row.expect[who]}`, async () => {
          signInAs(who === 'signed-out' ? null : actors[who].id);
          expect(await row.call(who)).toBe(row.expect[who]);
        });
      }
    }
  });

  describe('a foreign Origin is refused before anything runs, and stores nothing', () => {
    let draftId = 0;
    let reviewId = 0;
    beforeAll(async () => {
      draftId = (await createDraft(actors.editor, SLUG)).id;
      reviewId = await othersInReview();
    });
    const draft = (extra: Record<string, string> = {}) =>
      form({ revisionId: String(draftId), ...modulusFields(0, '3.1'), ...extra });
    const review = (extra: Record<string, string> = {}) =>
      form({ revisionId: String(reviewId), ...extra });
    const FOREIGN: [string, () => Promise<{ status: number }>][] = [
      ['createDraftAction', () => createDraftAction(initialActionState, form({ cultivar: SLUG }))],
      ['updateDraftAction', () => updateDraftAction(initialActionState, draft())],
      [
        'updateDraftAction with intent=submit',
        () => updateDraftAction(initialActionState, draft({ intent: 'submit' })),
      ],
      ['rebaseDraftAction', () => rebaseDraftAction(initialActionState, draft())],
      ['publishRevisionAction', () => publishRevisionAction(initialActionState, review())],
      [
        'returnRevisionAction',
        () => returnRevisionAction(initialActionState, review({ comment: 'From elsewhere.' })),
      ],
      [
        'resolveConflictAction',
        () =>
          resolveConflictAction(initialActionState, draft({ conflictId: '1', choice: 'theirs' })),
      ],
      ['createSourceAction', () => createSourceAction(initialActionState, draft(sourceFields()))],
    ];
    it('covers every action of the role table', () => {
      expect(FOREIGN.map(([name]) => name)).toEqual(ACTIONS.map((r) => r.name));
    });
    for (const [name, call] of FOREIGN) {
      it(`${name} from http://evil.example → 403`, async () => {
        signInAs(actors.editor.id);
        actionHeaders({ origin: 'http://evil.example' });
        const before = await snapshot();
        expect(await statusOf(call())).toBe(403);
        expect(await snapshot()).toEqual(before);
      });
    }
  });

  describe('the draft form: indexed fields become values', () => {
    const save = (id: number, fields: Record<string, string>) =>
      updateDraftAction(initialActionState, form({ revisionId: String(id), ...fields }));
    beforeEach(() => signInAs(actors.editor.id));

    it('stores every row in order, with its spread, conditions, source and default flag', async () => {
      const id = (await createDraft(actors.editor, SLUG)).id;
      const state = await save(id, {
        summary: 'Flesh modulus over the season; a typical Poisson ratio',
        ...modulusFields(0, '2.6'),
        'values.0.low': '2.36',
        'values.0.high': '3.28',
        'values.0.samples': '12',
        'values.0.method': 'Flesh cylinders in compression',
        'values.0.storage': 'Bulk storage, 15 Nov',
        'values.1.quantity': 'poisson_ratio',
        'values.1.variant': '',
        'values.1.value': '0.3',
        'values.1.isTypicalDefault': 'true',
        'values.1.typicalBasis': 'common practice',
        'values.1.stage': 'firm',
        'values.1.sourceKey': '',
      });
      expect(state, JSON.stringify(state)).toMatchObject({ status: 200, ok: true });
      const revision = await getRevision(actors.editor, id);
      expect(revision.summary).toBe('Flesh modulus over the season; a typical Poisson ratio');
      expect(revision.values).toHaveLength(2);
      expect(revision.values[0]).toMatchObject({
        quantity: 'youngs_modulus',
        variant: 'flesh',
        value: 2.6,
        unit: 'MPa',
        low: 2.36,
        high: 3.28,
        samples: 12,
        method: 'Flesh cylinders in compression',
        storage: 'Bulk storage, 15 Nov',
        isTypicalDefault: false,
        source: { key: 'shahabasi-1979' },
      });
      expect(revision.values[1]).toMatchObject({
        quantity: 'poisson_ratio',
        variant: '',
        value: 0.3,
        unit: '–',
        low: null,
        sd: null,
        isTypicalDefault: true,
        typicalBasis: 'common practice',
        stage: 'firm',
        source: null,
      });
    });

    it('a typical value without its basis, or a drop figure without what was observed: field errors, nothing stored', async () => {
      const id = (await createDraft(actors.editor, SLUG)).id;
      const rows = await countRows('revision_values');
      const state = await save(id, {
        summary: 'Missing evidence kinds',
        'values.0.quantity': 'poisson_ratio',
        'values.0.value': '0.3',
        'values.0.isTypicalDefault': 'true',
        'values.0.sourceKey': '',
        'values.1.quantity': 'drop_threshold_height',
        'values.1.variant': 'steel',
        'values.1.value': '300',
        'values.1.sourceKey': 'shahabasi-1979',
      });
      expect(state).toMatchObject({ status: 400, ok: false });
      expect(state.fieldErrors?.['values.0.typicalBasis']?.[0]).toMatch(
        /common practice or from memory/,
      );
      expect(state.fieldErrors?.['values.1.observation']?.[0]).toMatch(/no bruise at this level/);
      expect(await countRows('revision_values')).toBe(rows);
    });

    it('a bad number in values.1.value: a message on that field, nothing stored, typing kept', async () => {
      const id = (await createDraft(actors.editor, SLUG)).id;
      const before = await storedValues(id);
      const rows = await countRows('revision_values');
      const state = await save(id, {
        summary: 'should not be kept',
        ...modulusFields(0, '2.6'),
        ...modulusFields(1, '2,7 MPa'),
      });
      expect(state.status).toBe(400);
      expect(Object.keys(state.fieldErrors ?? {})).toEqual(['values.1.value']);
      expect(state.fieldErrors!['values.1.value'].join(' ')).toMatch(/must be a number/);
      expect(state.values?.['values.1.value']).toBe('2,7 MPa');
      expect(state.values?.summary).toBe('should not be kept');
      expect(await storedValues(id)).toEqual(before);
      expect(await countRows('revision_values')).toBe(rows);
      expect((await getRevision(actors.editor, id)).summary).toBeNull();
    });

    it('an empty value is refused as missing, not stored as 0', async () => {
      const id = (await createDraft(actors.editor, SLUG)).id;
      // Poisson's ratio accepts 0, so only treating '' as missing refuses it.
      const state = await save(id, {
        'values.0.quantity': 'poisson_ratio',
        'values.0.value': '',
        'values.0.isTypicalDefault': 'true',
      });
      expect(state.status).toBe(400);
      expect(Object.keys(state.fieldErrors ?? {})).toContain('values.0.value');
    });

    it("errors name the form's own row index when rows are not numbered 0, 1, 2", async () => {
      const id = (await createDraft(actors.editor, SLUG)).id;
      const state = await save(id, {
        ...modulusFields(3, '2.6'),
        ...modulusFields(7, '2.6'),
        'values.7.low': '2.9',
        'values.7.high': '3.1',
        'values.7.sourceKey': 'no-such-source',
      });
      expect(state.status).toBe(400);
      expect(Object.keys(state.fieldErrors ?? {}).sort()).toEqual(['values.7.low']);
      const unknown = await save(id, {
        ...modulusFields(3, '2.6'),
        ...modulusFields(7, '2.7'),
        'values.7.sourceKey': 'no-such-source',
      });
      expect(Object.keys(unknown.fieldErrors ?? {})).toEqual(['values.7.sourceKey']);
    });

    it('__proto__ and other unknown field names are ignored and pollute nothing', async () => {
      const id = (await createDraft(actors.editor, SLUG)).id;
      const raw = {
        // A computed key makes "__proto__" a real field name (a plain one would set the prototype).
        ['__proto__']: '{"polluted":"yes"}',
        constructor: 'x',
        'values.0.__proto__': '{"polluted":"yes"}',
        'values.__proto__.value': '9',
        'values.0.polluted': 'yes',
        ...modulusFields(0, '2.55'),
      };
      const fields = form(raw);
      const state = await updateDraftAction(initialActionState, withId(fields, id));
      expect(state, JSON.stringify(state)).toMatchObject({ status: 200, ok: true });
      expect(fields.has('__proto__')).toBe(true);
      expect(({} as Record<string, unknown>).polluted).toBeUndefined();
      expect(Object.getPrototypeOf({})).toBe(Object.prototype);
      expect(await storedValues(id)).toEqual([
        {
          quantity: 'youngs_modulus',
          variant: 'flesh',
          value: 2.55,
          low: null,
          high: null,
          source: 'shahabasi-1979',
        },
      ]);
    });

    it('intent=submit saves and then submits for review', async () => {
      const id = (await createDraft(actors.editor, SLUG)).id;
      const state = await save(id, { intent: 'submit', ...modulusFields(0, '2.58') });
      expect(state.status).toBe(200);
      const row = await db('property_revisions').where({ id }).first();
      expect(row.status).toBe('in_review');
      expect(await storedValues(id)).toHaveLength(1);
    });

    it('another editor may not save over a draft that is not theirs (403)', async () => {
      const id = (await createDraft(actors.editor2, SLUG)).id;
      const before = await storedValues(id);
      const state = await save(id, modulusFields(0, '9'));
      expect(state.status).toBe(403);
      expect(await storedValues(id)).toEqual(before);
    });
  });

  describe('review', () => {
    it('the author may not publish their own revision through the action (403)', async () => {
      const { id } = await createDraft(actors.editor, SLUG);
      await updateDraft(actors.editor, id, { values: [modulus(2.62)] });
      await submitDraft(actors.editor, id);
      signInAs(actors.editor.id);
      const state = await publishRevisionAction(
        initialActionState,
        form({ revisionId: String(id) }),
      );
      expect(state.status).toBe(403);
      expect(state.message).toMatch(/Another editor must review/);
      expect((await db('property_revisions').where({ id }).first()).status).toBe('in_review');
    });

    it('returning needs a comment: an empty one is a field error and changes nothing', async () => {
      const id = await othersInReview();
      signInAs(actors.editor.id);
      const state = await returnRevisionAction(
        initialActionState,
        form({ revisionId: String(id), comment: '  ' }),
      );
      expect(state.status).toBe(400);
      expect(Object.keys(state.fieldErrors ?? {})).toEqual(['comment']);
      expect((await db('property_revisions').where({ id }).first()).status).toBe('in_review');
    });

    it('publishing over a newer revision answers 409 and names the newer one', async () => {
      const first = await othersInReview(2.63);
      const second = await othersInReview(2.64);
      signInAs(actors.editor.id);
      const ok = await publishRevisionAction(
        initialActionState,
        form({ revisionId: String(first) }),
      );
      expect(ok.status).toBe(200);
      const stale = await publishRevisionAction(
        initialActionState,
        form({ revisionId: String(second) }),
      );
      const firstNumber = (await db('property_revisions').where({ id: first }).first()).number;
      expect(stale.status).toBe(409);
      expect(stale.message).toContain(`revision ${firstNumber} has been published since`);
      expect((await db('property_revisions').where({ id: second }).first()).status).toBe(
        'in_review',
      );
    });

    it('a tampered revision id is a 400, not a crash', async () => {
      signInAs(actors.editor.id);
      for (const revisionId of ['', '0', '1e3', '-4', 'abc']) {
        const state = await publishRevisionAction(initialActionState, form({ revisionId }));
        expect(state.status, revisionId).toBe(400);
      }
    });
  });
});
