// A studio's currency and locale: the demo's until its owner chooses, checked against ISO 4217 and
// BCP 47, and carried to the session, the schedule's CSV and the client's page.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { addMember, createTestApp, signUpStudio, type TestApp } from '../setup/app';
import { presentedProject } from '../ops/lib/fixtures';

type Agent = ReturnType<typeof request.agent>;

let t: TestApp;
let owner: Agent;
let designer: Agent;

beforeAll(async () => {
  t = createTestApp();
  owner = (await signUpStudio(t.app, 'Money Studio')).agent;
  designer = (await addMember(t, owner, 'designer')).agent;
});
afterAll(() => t.close());

describe('studio currency and locale', () => {
  it('starts as the demo’s, takes an owner’s valid choice, and refuses the rest naming the field', async () => {
    expect((await owner.get('/api/auth/me')).body.studio).toMatchObject({ currency: 'GBP', locale: 'en-GB' });
    const set = await owner.patch('/api/studio/settings').send({ currency: 'eur', locale: 'de-de' });
    expect(set.status).toBe(200);
    expect(set.body.settings).toEqual({ currency: 'EUR', locale: 'de-DE' });
    expect((await designer.get('/api/auth/me')).body.studio).toMatchObject({ currency: 'EUR', locale: 'de-DE' });

    const bad = await owner.patch('/api/studio/settings').send({ currency: 'EURO', locale: 'not a locale' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({
      currency: expect.stringMatching(/currency code/),
      locale: expect.stringMatching(/locale/),
    });
    expect((await designer.patch('/api/studio/settings').send({ currency: 'USD' })).status).toBe(403);
  });

  it('names the currency in the schedule CSV and gives it to the client’s page', async () => {
    const p = await presentedProject(owner, 'Priced flat');
    const csv = await owner.get(`/api/options/${p.optionIds[0]}/schedule.csv`);
    expect(csv.status).toBe(200);
    expect(csv.text.split('\n')[0]).toContain('Unit price (EUR)');
    expect(csv.text.split('\n')[0]).toContain('Total (EUR)');
    const page = await request(t.app).get(`/api/p/${p.token}`);
    expect(page.body.presentation).toMatchObject({ currency: 'EUR', locale: 'de-DE' });
  });
});
