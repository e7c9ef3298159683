import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { buildTree } from '../factories/tree.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
let staff: Awaited<ReturnType<typeof authAgentFor>>;
let volunteer: Awaited<ReturnType<typeof authAgentFor>>;
beforeAll(async () => {
  t = await createTestApp();
  staff = await authAgentFor(t, 'coordinator');
  volunteer = await authAgentFor(t, 'volunteer');
});
afterAll(() => t.close());

describe('PATCH /api/trees/:id with a note', () => {
  it('writes the note after what changed in the history line', async () => {
    const tree = await buildTree(t.db);
    const res = await staff.agent.patch(`/api/trees/${tree.id}`).set('X-CSRF-Token', staff.token).send({ healthy: false, note: 'Yellow leaves, scale insects' });
    expect(res.status).toBe(200);
    expect(res.body.tree).toMatchObject({ healthy: false });
    const detail = (await volunteer.agent.get(`/api/trees/${tree.id}`)).body;
    expect(detail.history[0]).toMatchObject({ kind: 'note', note: 'marked unhealthy: Yellow leaves, scale insects', healthy: false });
  });

  it('needs a change besides the note, and takes at most 400 characters of note', async () => {
    const tree = await buildTree(t.db, { healthy: true });
    const alone = await staff.agent.patch(`/api/trees/${tree.id}`).set('X-CSRF-Token', staff.token).send({ note: 'just a note' });
    expect(alone.status).toBe(400);
    const long = await staff.agent.patch(`/api/trees/${tree.id}`).set('X-CSRF-Token', staff.token).send({ healthy: false, note: 'x'.repeat(401) });
    expect(long.status).toBe(400);
    expect(ErrorBody.parse(long.body).error.fields).toHaveProperty('note');
    expect((await t.db.getRepository(Tree).findOneByOrFail({ id: tree.id })).healthy).toBe(true);
  });
});
