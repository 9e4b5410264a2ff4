// A client's choice is never deleted as a side effect: a room or option that a presentation still
// shows is not deleted (the refusal names the presentation), one a client chose is kept even once
// the presentation is withdrawn, and the database itself refuses. Deleting a room is one
// transaction: a failure part-way leaves the room as it was.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { sql } from 'kysely';
import { createTestApp, signUpStudio, type TestApp } from '../setup/app';
import { presentedProject, type PresentedProject } from '../ops/lib/fixtures';

type Agent = ReturnType<typeof request.agent>;

let t: TestApp;
let designer: Agent;

beforeAll(async () => {
  t = createTestApp();
  designer = (await signUpStudio(t.app, 'Keeping Studio')).agent;
});
afterAll(() => t.close());

const choose = (p: PresentedProject, optionId: string) =>
  request(t.app).put(`/api/p/${p.token}/rooms/${p.roomId}/choice`).send({ optionId, comment: 'This one' });
const choiceCount = async (presentationId: string) =>
  (
    await t.db
      .selectFrom('choices')
      .select((eb) => eb.fn.countAll<string>().as('n'))
      .where('presentation_id', '=', presentationId)
      .executeTakeFirstOrThrow()
  ).n;
const today = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric' }).format(new Date());

/** A presented project with a third option that no presentation shows. */
async function flat(): Promise<PresentedProject & { spareId: string }> {
  const p = await presentedProject(designer, 'Keeping flat');
  const spare = await designer.post(`/api/rooms/${p.roomId}/options`).send({ name: 'Spare' });
  return { ...p, spareId: spare.body.option.id };
}

describe('rooms and options a presentation shows', () => {
  it('refuses deleting them with 409 naming the presentation, and deletes an option no presentation shows', async () => {
    const p = await flat();
    await designer.post(`/api/presentations/${p.presentationId}/send`).send({ to: 'ida@example.com' });
    expect((await choose(p, p.optionIds[1])).status).toBe(200);

    const room = await designer.delete(`/api/rooms/${p.roomId}`);
    expect(room.status).toBe(409);
    expect(room.body.error).toMatchObject({ code: 'in_presentation' });
    expect(room.body.error.message).toBe(
      `This room is shown in the presentation made on ${today} for ida@example.com. Withdraw that presentation first, then delete the room.`,
    );
    expect(room.body.presentationId).toBe(p.presentationId);

    // An option shown but not chosen is refused as well.
    const option = await designer.delete(`/api/options/${p.optionIds[0]}`);
    expect(option.status).toBe(409);
    expect(option.body.error.message).toMatch(
      /^This option is shown in the presentation made on .* Withdraw that presentation first/,
    );

    expect((await designer.get(`/api/rooms/${p.roomId}`)).body.options).toHaveLength(3);
    expect(await choiceCount(p.presentationId)).toBe('1');
    expect((await designer.delete(`/api/options/${p.spareId}`)).status).toBe(204);
  });

  it('names the newest of several presentations and counts the others', async () => {
    const p = await flat();
    await designer
      .post(`/api/projects/${p.projectId}/presentations`)
      .send({ rooms: [{ roomId: p.roomId, optionIds: [p.optionIds[0]] }] });
    const res = await designer.delete(`/api/options/${p.optionIds[0]}`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/^This option is shown in the presentation made on [^(]+ \(and 1 more\)\./);
  });

  it('once withdrawn: an option nobody chose can go, but a chosen one and its room are kept with the choice', async () => {
    const p = await flat();
    expect((await choose(p, p.optionIds[1])).status).toBe(200);
    await designer.post(`/api/presentations/${p.presentationId}/withdraw`);

    expect((await designer.delete(`/api/options/${p.optionIds[0]}`)).status).toBe(204);
    const chosen = await designer.delete(`/api/options/${p.optionIds[1]}`);
    expect(chosen.status).toBe(409);
    expect(chosen.body.error).toMatchObject({
      code: 'in_presentation',
      message: expect.stringMatching(
        /^A client chose this option in the presentation made on .* \(withdrawn\)\. Their choice is kept/,
      ),
    });
    const room = await designer.delete(`/api/rooms/${p.roomId}`);
    expect(room.status).toBe(409);
    expect(room.body.error.message).toMatch(/^A client chose an option of this room/);

    expect(await choiceCount(p.presentationId)).toBe('1');
    const list = (await designer.get(`/api/projects/${p.projectId}/presentations`)).body.presentations;
    expect(list[0].rooms[0].choice).toMatchObject({ optionId: p.optionIds[1], comment: 'This one' });
  });

  it('the database refuses too: deleting a chosen room or option directly fails and keeps the choice', async () => {
    const p = await flat();
    expect((await choose(p, p.optionIds[0])).status).toBe(200);
    await expect(t.db.deleteFrom('options').where('id', '=', p.optionIds[0]).execute()).rejects.toMatchObject({
      code: '23503',
      constraint: 'choices_option_fk',
    });
    await expect(t.db.deleteFrom('rooms').where('id', '=', p.roomId).execute()).rejects.toMatchObject({ code: '23503' });
    expect(await choiceCount(p.presentationId)).toBe('1');
    // Choices still go with their presentation, and so with the project.
    await t.db.deleteFrom('projects').where('id', '=', p.projectId).execute();
    expect(await choiceCount(p.presentationId)).toBe('0');
  });
});

describe('deleting a room is one transaction', () => {
  it('a failure after the room is deleted leaves it, its options and the project as they were', async () => {
    const projectId = (await designer.post('/api/projects').send({ name: 'Half-deleted', newClient: { name: 'Hal' } })).body
      .project.id as string;
    const room = (
      await designer.post(`/api/projects/${projectId}/rooms`).send({
        name: 'Box room',
        shell: {
          outline: [
            [0, 0],
            [2000, 0],
            [2000, 2000],
            [0, 2000],
          ],
        },
      })
    ).body.room;
    // The project's "changed" stamp, written after the room is gone, fails for this project only.
    const fn = sql.id(`fail_touch_${projectId.replaceAll('-', '')}`);
    await sql`create function ${fn}() returns trigger language plpgsql as $$
      begin if new.id = ${sql.lit(projectId)}::uuid then raise exception 'touch refused for the test'; end if; return new; end $$`.execute(
      t.db,
    );
    await sql`create trigger ${fn} before update on projects for each row execute function ${fn}()`.execute(t.db);
    try {
      const res = await designer.delete(`/api/rooms/${room.id}`);
      expect(res.status).toBe(500);
    } finally {
      await sql`drop trigger ${fn} on projects`.execute(t.db);
      await sql`drop function ${fn}()`.execute(t.db);
    }
    const still = await designer.get(`/api/rooms/${room.id}`);
    expect(still.status).toBe(200);
    expect(still.body.options).toHaveLength(1);
    expect((await designer.delete(`/api/rooms/${room.id}`)).status).toBe(204);
    expect((await designer.get(`/api/rooms/${room.id}`)).status).toBe(404);
  });
});
