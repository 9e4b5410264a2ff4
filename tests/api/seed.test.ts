// Tests the demo seed: it seeds the demo studio once, and the demo owner sees the two-room flat
// with two options per room.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, type TestApp } from '../setup/app';
import { DEMO_SIGN_IN, seedDemo } from '../../server/cli/seed';

let t: TestApp;
beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

describe('demo data', () => {
  it('seeds the demo studio once; the demo owner sees the two-room flat with two options per room', async () => {
    // Another test file may have seeded this shared database already; either way a second call adds nothing.
    await seedDemo(t.db);
    const owners = () => t.db.selectFrom('members').select('id').where('email', '=', DEMO_SIGN_IN.email).execute();
    expect(await owners()).toHaveLength(1);
    expect(await seedDemo(t.db)).toBe(false);
    expect(await owners()).toHaveLength(1);
    const agent = request.agent(t.app);
    expect((await agent.post('/api/auth/sign-in').send(DEMO_SIGN_IN)).status).toBe(200);
    const projects = (await agent.get('/api/projects')).body.projects;
    const flat = projects.find((p: { name: string }) => p.name === 'Canal Row flat');
    expect(flat.roomCount).toBe(2);
    const rooms = (await agent.get(`/api/projects/${flat.id}/rooms`)).body.rooms;
    expect(rooms.map((r: { name: string }) => r.name)).toEqual(['L-shaped living room', 'Bedroom']);
    for (const r of rooms) {
      const detail = (await agent.get(`/api/rooms/${r.id}`)).body;
      expect(detail.options).toHaveLength(2);
      expect(detail.options[0].doc.pieces.length).toBeGreaterThan(3);
      expect(detail.options[1].doc.pieces).not.toEqual(detail.options[0].doc.pieces);
    }
    // The L-shape (6.2 × 3.4 m plus 3.8 × 2.2 m) is 21.08 + 8.36 = 29.44 m² (derived).
    expect(rooms[0].floorAreaM2).toBeCloseTo(29.44, 2);
    // A presentation of both rooms, ready to send; the flat is with the client.
    expect(flat.state).toBe('presented');
    const presentations = (await agent.get(`/api/projects/${flat.id}/presentations`)).body.presentations;
    expect(presentations).toHaveLength(1);
    expect(JSON.stringify(presentations[0])).toContain(rooms[0].id);
  });
});
