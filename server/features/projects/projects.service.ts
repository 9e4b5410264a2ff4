// The projects feature's rules and transactions: a project is made for one of the studio's clients
// or a new one, changes state only the ways project-states.ts allows, and a decided project is
// reopened by name and date. SQL lives in projects.repository.ts; routes only call these.
import type { AppServices } from '../../context';
import type { Db } from '../../db/database';
import type { CreateProjectBody, ListQuery, ProjectDetail, ProjectPatch, ProjectSummary } from '../../../shared/schemas/project';
import { HttpError, orNotFound } from '../../http/errors';
import { getClient, insertClient } from '../clients/clients.repository';
import { getProject, insertProject, listProjects, lockProjectState, reopenProject, updateProject } from './projects.repository';
import { patchStateChange } from './project-states';
import { projectMail } from '../outbox/mail-queue';

/** The caller a change is made for: which studio, and which member (recorded on a reopen). */
export interface Acting {
  studioId: string;
  memberId: string;
}

/** One of the studio's projects; 404 when the studio has no such project. */
export async function projectOrThrow(db: Db, studioId: string, id: string): Promise<ProjectSummary> {
  return orNotFound(await getProject(db, studioId, id), 'That project');
}

/** The studio's projects, searched, filtered and sorted as asked. */
export async function findProjects(db: Db, studioId: string, query: ListQuery): Promise<ProjectSummary[]> {
  return listProjects(db, studioId, query);
}

/** A new project for one of the studio's clients, or for a new client made with it, in one transaction. */
export async function createProject(db: Db, studioId: string, input: CreateProjectBody): Promise<ProjectSummary> {
  const id = await db.transaction().execute(async (trx) => {
    let clientId = input.clientId;
    if (clientId) {
      if (!(await getClient(trx, studioId, clientId))) {
        throw new HttpError(400, 'invalid', 'Pick one of your clients.', { clientId: 'Pick one of your clients.' });
      }
    } else {
      // The body's schema holds either a client's id or a new client.
      clientId = (await insertClient(trx, studioId, input.newClient!)).id;
    }
    return (await insertProject(trx, { studioId, clientId, name: input.name, address: input.address ?? null })).id;
  });
  return projectOrThrow(db, studioId, id);
}

/** A project and how to reach its client, for the project page. */
export async function projectDetail(db: Db, studioId: string, id: string): Promise<ProjectDetail> {
  const project = await projectOrThrow(db, studioId, id);
  const client = await getClient(db, studioId, project.client.id);
  return {
    project,
    client: client ? { id: client.id, name: client.name, email: client.email, phone: client.phone } : null,
    mail: await projectMail(db, studioId, id),
  };
}

/** Renames, re-addresses, archives or restores a project; other state changes are refused, naming the way. */
export async function changeProject(db: Db, studioId: string, id: string, patch: ProjectPatch): Promise<ProjectSummary> {
  const { state, ...rest } = patch;
  await db.transaction().execute(async (trx) => {
    const current = orNotFound(await lockProjectState(trx, studioId, id), 'That project');
    const change = state ? patchStateChange(current.state, current.previous_state, state) : null;
    const changes = change ? { ...rest, state: change.state, previous_state: change.previousState } : rest;
    await updateProject(trx, studioId, id, changes);
  });
  return projectOrThrow(db, studioId, id);
}

/**
 * Decided → presented, on purpose: the clients' links can change their choices again. Records who
 * reopened it and when.
 */
export async function reopenDecidedProject(
  services: Pick<AppServices, 'db' | 'links'>,
  by: Acting,
  projectId: string,
): Promise<ProjectSummary> {
  await services.db.transaction().execute(async (trx) => {
    const current = orNotFound(await lockProjectState(trx, by.studioId, projectId), 'That project');
    if (current.state === 'archived') throw new HttpError(409, 'archived', 'This project is archived. Restore it first.');
    if (!(await reopenProject(trx, by.studioId, projectId, by.memberId))) {
      throw new HttpError(409, 'not_decided', 'Only a decided project can be reopened; this one is not decided.');
    }
  });
  // Every link of the studio shows whether the project is decided: drop what this instance keeps.
  services.links.forgetStudio(by.studioId);
  return projectOrThrow(services.db, by.studioId, projectId);
}
