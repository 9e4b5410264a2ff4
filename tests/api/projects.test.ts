// API tests for clients and projects: creating a project with a new client in one transaction,
// another studio's client refused, search, sort, rename, archive and bad input.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, signUpStudio, type TestApp } from '../setup/app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

describe('clients and projects', () => {
  it('creates a project with a new client in one transaction and lists it', async () => {
    const { agent } = await signUpStudio(t.app);
    const res = await agent
      .post('/api/projects')
      .send({ name: 'Mill House', address: '2 Weir Road', newClient: { name: 'Jo Bright', email: 'JO@example.com' } });
    expect(res.status).toBe(201);
    expect(res.body.project).toMatchObject({ name: 'Mill House', state: 'draft', client: { name: 'Jo Bright' }, roomCount: 0 });
    const clients = await agent.get('/api/clients');
    expect(clients.body.clients).toEqual([
      expect.objectContaining({ name: 'Jo Bright', email: 'jo@example.com', projectCount: 1 }),
    ]);
  });

  it('leaves nothing half-written when the new client is invalid', async () => {
    const { agent } = await signUpStudio(t.app);
    const res = await agent.post('/api/projects').send({ name: 'Broken', newClient: { name: '', email: 'nope' } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({ 'newClient.name': expect.any(String), 'newClient.email': expect.any(String) });
    expect((await agent.get('/api/clients')).body.clients).toHaveLength(0);
    expect((await agent.get('/api/projects')).body.projects).toHaveLength(0);
  });

  it('refuses another studio’s client as the project’s client', async () => {
    const a = await signUpStudio(t.app);
    const b = await signUpStudio(t.app);
    const client = await b.agent.post('/api/clients').send({ name: 'B client' });
    const res = await a.agent.post('/api/projects').send({ name: 'Sneaky', clientId: client.body.client.id });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.clientId).toBeTruthy();
  });

  it('searches, sorts by last change or name, renames and archives', async () => {
    const { agent } = await signUpStudio(t.app);
    const make = (name: string, client: string) => agent.post('/api/projects').send({ name, newClient: { name: client } });
    const alpha = (await make('Alpha loft', 'Quinn')).body.project;
    await make('Beta cottage', 'Rae');
    await make('Gamma barn', 'Quinn Two');
    const byUpdate = (await agent.get('/api/projects')).body.projects.map((p: { name: string }) => p.name);
    expect(byUpdate).toEqual(['Gamma barn', 'Beta cottage', 'Alpha loft']);
    const byName = (await agent.get('/api/projects?sort=name')).body.projects.map((p: { name: string }) => p.name);
    expect(byName).toEqual(['Alpha loft', 'Beta cottage', 'Gamma barn']);
    const search = (await agent.get('/api/projects?q=quinn')).body.projects.map((p: { name: string }) => p.name).sort();
    expect(search).toEqual(['Alpha loft', 'Gamma barn']);
    // A search for a wildcard character matches it literally.
    expect((await agent.get('/api/projects?q=%25')).body.projects).toHaveLength(0);

    expect((await agent.patch(`/api/projects/${alpha.id}`).send({ name: 'Alpha studio' })).body.project.name).toBe(
      'Alpha studio',
    );
    expect((await agent.get('/api/projects')).body.projects[0].name).toBe('Alpha studio');
    await agent.patch(`/api/projects/${alpha.id}`).send({ state: 'archived' });
    expect((await agent.get('/api/projects')).body.projects.map((p: { name: string }) => p.name)).not.toContain('Alpha studio');
    expect((await agent.get('/api/projects?archived=only')).body.projects.map((p: { name: string }) => p.name)).toEqual([
      'Alpha studio',
    ]);
  });

  it('answers a malformed id or query with 400, not a crash', async () => {
    const { agent } = await signUpStudio(t.app);
    const bad = await agent.get('/api/projects/not-a-uuid');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.id).toBeTruthy();
    expect((await agent.get('/api/projects?sort=sideways')).status).toBe(400);
    expect((await agent.patch('/api/projects/00000000-0000-4000-8000-000000000000').send({ state: 'lost' })).status).toBe(400);
  });
});
