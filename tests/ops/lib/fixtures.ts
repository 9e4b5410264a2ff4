// A small project with one room, two options and a presentation link, made through the API so
// tests and the load benchmark exercise the same paths a designer does.
import type { Test } from 'supertest';

/** What both supertest agents and the plain HTTP client in the ops tests can do. */
export interface ApiClient {
  post(path: string): Test;
  put(path: string): Test;
}

export interface PresentedProject {
  projectId: string;
  roomId: string;
  optionIds: string[];
  presentationId: string;
  /** The client's token, from the link's last path segment. */
  token: string;
}

const SQUARE = {
  outline: [
    [0, 0],
    [4200, 0],
    [4200, 3600],
    [0, 3600],
  ],
};
/** About the demo's size: a sofa, tables, shelving and lamps. */
const PIECES_PER_OPTION = 12;

function pieces(tag: string) {
  return Array.from({ length: PIECES_PER_OPTION }, (_, i) => ({
    id: `${tag}-${i}`,
    name: `Piece ${i}`,
    x: 600 + (i % 4) * 900,
    y: 600 + Math.floor(i / 4) * 1000,
    width: 700,
    depth: 500,
    height: 700,
    status: i % 3 === 0 ? 'existing' : 'new',
    price: 100 + i * 10,
  }));
}

async function ok<T>(req: Test, status: number, what: string): Promise<T> {
  const res = await req;
  if (res.status !== status) throw new Error(`${what}: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as T;
}

export async function presentedProject(agent: ApiClient, name = 'Load flat'): Promise<PresentedProject> {
  const { project } = await ok<{ project: { id: string } }>(
    agent.post('/api/projects').send({ name, newClient: { name: 'Ida Quill', email: 'ida@example.com' } }),
    201,
    'project',
  );
  const created = await ok<{ room: { id: string }; options: { id: string; version: number }[] }>(
    agent.post(`/api/projects/${project.id}/rooms`).send({ name: 'Sitting room', shell: SQUARE }),
    201,
    'room',
  );
  const second = await ok<{ option: { id: string; version: number } }>(
    agent.post(`/api/rooms/${created.room.id}/options`).send({ name: 'Walnut' }),
    201,
    'option',
  );
  const options = [created.options[0], second.option];
  for (const [i, o] of options.entries()) {
    await ok(
      agent.put(`/api/options/${o.id}`).send({ doc: { pieces: pieces(`o${i}`) }, version: o.version }),
      200,
      'save option',
    );
  }
  const made = await ok<{ presentation: { id: string; link: string } }>(
    agent.post(`/api/projects/${project.id}/presentations`).send({
      rooms: [{ roomId: created.room.id, optionIds: options.map((o) => o.id) }],
      message: 'Two ways to furnish it.',
      showPrices: true,
    }),
    201,
    'presentation',
  );
  const token = made.presentation.link.split('/p/')[1];
  return {
    projectId: project.id,
    roomId: created.room.id,
    optionIds: options.map((o) => o.id),
    presentationId: made.presentation.id,
    token,
  };
}
