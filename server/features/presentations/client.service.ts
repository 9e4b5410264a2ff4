// The client's side of a presentation: what a link's holder may do with it (open it, say they
// looked at an option, choose one per room), each authorised by the link's token alone, and the
// designer's e-mail when they choose.
import type { AppServices } from '../../context';
import type { Db } from '../../db/database';
import type { Logger } from '../../services/logging/logger';
import type { Caller } from '../../http/routes';
import type { Choice, ClientPresentation } from '../../../shared/schemas/presentation';
import { optionLabel } from '../../../shared/schemas/room-api';
import { HttpError, tooManyRequests } from '../../http/errors';
import { hitRateLimit, type RateRule } from '../../services/rate-limit/rate-limit';
import { lockProjectState, touchProject } from '../projects/projects.repository';
import { canPresentationReadFile } from '../files/files.access';
import { keyFromFileName } from '../files/file-keys';
import { queueStudioMail } from '../outbox/mail-queue';
import {
  getChoice,
  isShownOption,
  listShownOptions,
  notifyAddresses,
  projectForPresentation,
  recordViewed,
  saveChoice,
  type PresentationRow,
} from './presentations.repository';
import { choiceMail } from '../../services/mail/templates';
import {
  clientPresentation,
  linkNotFound,
  presentationFinishIds,
  presentationForToken,
  presentationModelIds,
} from './presentations.service';
import type { CachedLink } from './client-cache';

const RATE_WINDOW_MS = 10 * 60_000;
/** Choice posts per link per window: plenty for a family changing its mind, too few to flood the designer's inbox. */
export const CHOICE_RATE: RateRule = { bucket: 'presentation-choice', limit: 20, windowMs: RATE_WINDOW_MS };
/** "Looked at" posts per link per window: one per option shown, with room for a long evening. */
export const VIEW_RATE: RateRule = { bucket: 'presentation-view', limit: 300, windowMs: RATE_WINDOW_MS };

// The studio's own members opening the link (to check it) are not the client: their visits and
// looks are not recorded.
const isStudioMember = (caller: Caller | null, p: PresentationRow) => caller?.studioId === p.studio_id;

/**
 * Counts one post of the link under `rule`, inside the transaction holding its row: a refused
 * post rolls back with it, so it is not counted. Over the limit it answers 429 with the window as
 * Retry-After.
 */
async function countLinkPost(trx: Db, rule: RateRule, p: PresentationRow): Promise<void> {
  if ((await hitRateLimit(trx, rule, p.id)).allowed) return;
  throw tooManyRequests(
    'That was a lot of changes in a short time. Please wait a few minutes, then try again.',
    Math.ceil(rule.windowMs / 1000),
  );
}

/** The link's answer as the link cache keeps it: built once per link, served as it is. */
export async function loadClientLink(services: Pick<AppServices, 'db' | 'config'>, token: string): Promise<CachedLink> {
  const p = await presentationForToken(services.db, services.config, token);
  const answer: { presentation: ClientPresentation } = { presentation: await clientPresentation(services.db, p, token) };
  return { presentationId: p.id, studioId: p.studio_id, expiresAt: p.expires_at, body: JSON.stringify(answer) };
}

/**
 * The stored file a link's visitor asks for by `name`, when the link may load it (a texture of a
 * finish its shown options wear), else null. The link is checked first: a link that no longer
 * works answers as such. Another finish's file and no file at all answer the same, so names
 * cannot be probed.
 */
export async function linkFileKey(
  services: Pick<AppServices, 'db' | 'config'>,
  token: string,
  name: string,
): Promise<string | null> {
  const p = await presentationForToken(services.db, services.config, token);
  const key = keyFromFileName(name);
  const [finishIds, modelIds] = await Promise.all([presentationFinishIds(services.db, p), presentationModelIds(services.db, p)]);
  const scope = { studioId: p.studio_id, finishIds, modelIds };
  return key && (await canPresentationReadFile(services.db, scope, key)) ? key : null;
}

/** Records that the client looked at a shown option (the studio's own members are not counted). */
export async function recordView(
  services: Pick<AppServices, 'db' | 'config'>,
  v: { token: string; caller: Caller | null; optionId: string },
): Promise<void> {
  await services.db.transaction().execute(async (trx) => {
    const p = await presentationForToken(trx, services.config, v.token, { forUpdate: true });
    await countLinkPost(trx, VIEW_RATE, p);
    const ok = isStudioMember(v.caller, p)
      ? await isShownOption(trx, p.id, v.optionId)
      : await recordViewed(trx, p.id, v.optionId, new Date());
    if (!ok) throw new HttpError(404, 'not_found', 'That option is not part of this presentation.');
  });
}

export interface ChoiceResult {
  presentation: PresentationRow;
  changed: boolean;
  choice: Choice;
}

/**
 * Saves the client's choice for one room, unless the project is decided. Asking again for the
 * same choice and comment changes nothing. `roomId` is null when the path's room is not an id.
 */
export async function chooseOption(
  services: Pick<AppServices, 'db' | 'config'>,
  v: { token: string; roomId: string | null; optionId: string; comment: string },
): Promise<ChoiceResult> {
  return services.db.transaction().execute(async (trx) => {
    // Holding the row serialises this link's posts across instances.
    const p = await presentationForToken(trx, services.config, v.token, { forUpdate: true });
    const { roomId } = v;
    if (!roomId) throw linkNotFound();
    await countLinkPost(trx, CHOICE_RATE, p);
    // Held until the choice is saved, so Mark as decided cannot slip in between.
    const project = await lockProjectState(trx, p.studio_id, p.project_id, 'share');
    if (!project) throw linkNotFound();
    if (project.state === 'decided' || project.state === 'archived') {
      throw new HttpError(
        409,
        'decided',
        'Your designer has confirmed the choices for this project, so they cannot be changed here. Get in touch with them to change anything.',
      );
    }
    if (!(await isShownOption(trx, p.id, v.optionId, roomId)))
      throw new HttpError(404, 'not_found', 'That option is not part of this presentation.');
    const current = await getChoice(trx, p.id, roomId);
    if (current && current.option_id === v.optionId && current.comment === v.comment) {
      return {
        presentation: p,
        changed: false,
        choice: { optionId: current.option_id, comment: current.comment, chosenAt: current.chosen_at.toISOString() },
      };
    }
    const at = new Date();
    await saveChoice(trx, { presentationId: p.id, roomId, optionId: v.optionId, comment: v.comment, at });
    await touchProject(trx, p.project_id);
    return {
      presentation: p,
      changed: true,
      choice: { optionId: v.optionId, comment: v.comment, chosenAt: at.toISOString() },
    };
  });
}

/**
 * Tells the designer (the presentation's creator, else the studio's owners) what the client chose,
 * through the job queue: the mail is retried while the mail server is away, and the project page
 * shows whether it has gone. Never fails: the choice is saved either way.
 */
export async function notifyDesigner(
  services: Pick<AppServices, 'db' | 'config' | 'jobs'>,
  log: Logger,
  p: PresentationRow,
  choice: { roomId: string; optionId: string; comment: string },
): Promise<void> {
  const { db, config } = services;
  try {
    const [project, shown, to] = await Promise.all([
      projectForPresentation(db, p.studio_id, p.project_id),
      listShownOptions(db, [p.id]),
      notifyAddresses(db, p.studio_id, p.created_by),
    ]);
    const inRoom = shown.filter((s) => s.room_id === choice.roomId);
    const index = inRoom.findIndex((s) => s.option_id === choice.optionId);
    if (!project || index < 0) return;
    const mail = {
      clientName: project.client_name,
      project: project.name,
      room: inRoom[index].room_name,
      option: optionLabel(index, inRoom[index].option_name),
      comment: choice.comment,
      projectLink: `${config.publicUrl}/projects/${project.id}`,
    };
    for (const address of to)
      await queueStudioMail(db, services.jobs, {
        studioId: p.studio_id,
        projectId: project.id,
        kind: 'choice',
        ...choiceMail({ to: address, ...mail }),
      });
  } catch (err) {
    log.error({ err }, 'choice notification could not be queued');
  }
}
