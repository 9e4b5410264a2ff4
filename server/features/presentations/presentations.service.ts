// What a presentation shows and to whom (the designer's summary, the client's payload with only the
// chosen rooms and options, prices only when shown, the link and the e-mails), and the designer's
// actions on it, each with its rules and its transaction.
import { isUuid } from '../../../shared/schemas/common';
import type { z } from 'zod';
import type { AppConfig } from '../../config';
import type { AppServices } from '../../context';
import type { Db } from '../../db/database';
import type { Logger } from '../../services/logging/logger';
import { WRITERS, type Caller } from '../../http/routes';
import { HttpError, notFound, orNotFound } from '../../http/errors';
import { optionDocSchema, withoutNonWebLinks, type OptionDoc, type Piece } from '../../../shared/schemas/option';
import { optionFinishIds, optionSurfaces } from '../../../shared/finishes/option-surfaces';
import type { Finish } from '../../../shared/schemas/finish';
import { roomShellSchema } from '../../../shared/schemas/room';
import { optionLabel } from '../../../shared/schemas/room-api';
import {
  LINK_LIFETIME_DAYS,
  type createPresentationSchema,
  type sendPresentationSchema,
  type Choice,
  type ClientPiece,
  type ClientPresentation,
  type ClientRoom,
  type ClientSurfaces,
  type PresentationState,
  type PresentationSummary,
} from '../../../shared/schemas/presentation';
import { toFinishes } from '../finishes/finishes.service';
import { readyModelsByIds } from '../models/models.service';
import type { PieceModelRow } from '../models/models.repository';
import { fileUrl } from '../files/file-keys';
import { modelTurnSchema, type ClientModel } from '../../../shared/schemas/piece-model';
import {
  newTokenId,
  signPresentationToken,
  toTokenTime,
  verifyPresentationToken,
} from '../../services/tokens/presentation-token';
import { limitPresentationMail } from '../../services/rate-limit/mail-limits';
import { sendStudioMail } from '../outbox/outbox.service';
import { listMembers } from '../studio/members.repository';
import { lockProjectState } from '../projects/projects.repository';
import { DECIDED_REOPEN_FIRST, decidedRefusal } from '../projects/project-states';
import { presentationMail } from '../../services/mail/templates';
import { studioMoney } from '../studio/studios.repository';
import {
  finishLabels,
  finishRows,
  findByTokenId,
  getPresentation,
  insertPresentation,
  insertShownRooms,
  latestDecision,
  listChoices,
  listPresentations,
  listShownOptions,
  projectForPresentation,
  roomsWithOptions,
  setProjectState,
  updatePresentation,
  type PresentationRow,
} from './presentations.repository';
import { studioCreatedAt, studioName } from '../studio/studios.repository';

export function presentationState(p: Pick<PresentationRow, 'withdrawn_at' | 'expires_at'>, now = new Date()): PresentationState {
  if (p.withdrawn_at) return 'withdrawn';
  return p.expires_at.getTime() <= now.getTime() ? 'expired' : 'active';
}

export async function presentationLink(config: AppConfig, p: PresentationRow): Promise<string> {
  const token = await signPresentationToken(config.presentationKey, {
    tokenId: p.token_id,
    issuedAt: p.issued_at,
    expiresAt: p.token_expires_at,
  });
  return `${config.publicUrl}/p/${token}`;
}

// The client's answers say only what happened to the link, never why in detail.
export const linkNotFound = () =>
  new HttpError(
    404,
    'link_not_found',
    'This link does not work. Check that it was copied whole, or ask your designer for a new one.',
  );
export const linkExpired = () => new HttpError(410, 'link_expired', 'This link has expired. Ask your designer for a new one.');
export const linkWithdrawn = () =>
  new HttpError(410, 'link_withdrawn', 'This link is no longer available. Ask your designer if you need it again.');

/**
 * The presentation behind a client's token, refused unless the link still works. Any failure of
 * the token itself reads the same as an unknown link.
 */
export async function presentationForToken(
  db: Db,
  config: AppConfig,
  token: string,
  opts: { forUpdate?: boolean } = {},
): Promise<PresentationRow> {
  const check = await verifyPresentationToken(config.presentationKey, token);
  if (!check.ok) throw check.reason === 'expired' ? linkExpired() : linkNotFound();
  const p = await findByTokenId(db, check.tokenId, opts);
  if (!p) throw linkNotFound();
  const state = presentationState(p);
  if (state === 'withdrawn') throw linkWithdrawn();
  if (state === 'expired') throw linkExpired();
  return p;
}

type ShownRow = Awaited<ReturnType<typeof listShownOptions>>[number];
type ChoiceRow = Awaited<ReturnType<typeof listChoices>>[number];

const toChoice = (c: Pick<ChoiceRow, 'option_id' | 'comment' | 'chosen_at'>): Choice => ({
  optionId: c.option_id,
  comment: c.comment,
  chosenAt: c.chosen_at.toISOString(),
});

/** Shown rows grouped by room, both in the presentation's order. */
function groupByRoom(rows: ShownRow[]): { roomId: string; name: string; shell: unknown; options: ShownRow[] }[] {
  const rooms = new Map<string, { roomId: string; name: string; shell: unknown; options: ShownRow[] }>();
  for (const r of rows) {
    const room = rooms.get(r.room_id) ?? { roomId: r.room_id, name: r.room_name, shell: r.shell, options: [] };
    room.options.push(r);
    rooms.set(r.room_id, room);
  }
  return [...rooms.values()];
}

/** The designer's view of each presentation of a project, newest first. */
export async function presentationSummaries(
  db: Db,
  config: AppConfig,
  rows: PresentationRow[],
  opts: { withLinks: boolean; memberNames: Map<string, string> },
): Promise<PresentationSummary[]> {
  const ids = rows.map((r) => r.id);
  const [shown, choices] = await Promise.all([listShownOptions(db, ids), listChoices(db, ids)]);
  return Promise.all(
    rows.map(async (p) => {
      const rooms = groupByRoom(shown.filter((s) => s.presentation_id === p.id)).map((room) => {
        const choice = choices.find((c) => c.presentation_id === p.id && c.room_id === room.roomId);
        return {
          roomId: room.roomId,
          name: room.name,
          options: room.options.map((o, i) => ({
            optionId: o.option_id,
            label: optionLabel(i, o.option_name),
            viewCount: o.view_count,
            lastViewedAt: o.last_viewed_at?.toISOString() ?? null,
            changedSinceSent: o.sent_version !== null && o.sent_version !== o.option_version,
          })),
          choice: choice ? toChoice(choice) : null,
        };
      });
      const state = presentationState(p);
      return {
        id: p.id,
        state,
        message: p.message,
        showPrices: p.show_prices,
        createdAt: p.created_at.toISOString(),
        createdBy: p.created_by ? (opts.memberNames.get(p.created_by) ?? null) : null,
        expiresAt: p.expires_at.toISOString(),
        latestExpiry: p.token_expires_at.toISOString(),
        withdrawnAt: p.withdrawn_at?.toISOString() ?? null,
        decidedAt: p.decided_at?.toISOString() ?? null,
        sentAt: p.sent_at?.toISOString() ?? null,
        sentTo: p.sent_to,
        firstOpenedAt: p.first_opened_at?.toISOString() ?? null,
        lastOpenedAt: p.last_opened_at?.toISOString() ?? null,
        openCount: p.open_count,
        link: opts.withLinks ? await presentationLink(config, p) : null,
        rooms,
        complete: state !== 'withdrawn' && rooms.length > 0 && rooms.every((r) => r.choice !== null),
      };
    }),
  );
}

/**
 * A piece as the client may see it, built field by field so nothing added to pieces later leaks
 * by default: no supplier link, no finish id, a price only when the designer shows prices.
 */
export function toClientPiece(
  piece: Piece,
  showPrices: boolean,
  finishes: Map<string, { name: string; colourHex: string | null }>,
): ClientPiece {
  const out: ClientPiece = {
    id: piece.id,
    name: piece.name,
    x: piece.x,
    y: piece.y,
    width: piece.width,
    depth: piece.depth,
    height: piece.height,
    rotation: piece.rotation,
    elevation: piece.elevation,
    status: piece.status,
    placed: piece.placed,
    finish: piece.finishId ? (finishes.get(piece.finishId) ?? null) : null,
  };
  if (piece.colour) out.colour = piece.colour;
  if (piece.kind) out.kind = piece.kind;
  if (piece.settings) out.settings = piece.settings;
  if (piece.accentColour) out.accentColour = piece.accentColour;
  if (showPrices && piece.price !== undefined) out.price = piece.price;
  return out;
}

/** The finish ids of an option the link may load: its own, when they can be library ids at all. */
const linkFinishIds = (doc: OptionDoc) => optionFinishIds(doc).filter((id) => isUuid(id));

/** The finish ids the shown options of a presentation use: the finishes whose files its link may load. */
export async function presentationFinishIds(db: Db, p: PresentationRow): Promise<string[]> {
  const shown = await listShownOptions(db, [p.id]);
  return [...new Set(shown.flatMap((s) => linkFinishIds(optionDocSchema.parse(withoutNonWebLinks(s.doc)))))];
}

/** The models an option's placed pieces wear (ids only; the link may load just these models' files). */
const placedModelIds = (doc: OptionDoc) =>
  doc.pieces.filter((piece) => piece.placed && piece.modelId && isUuid(piece.modelId)).map((piece) => piece.modelId!);

/** Models worn by the pieces of a presentation's shown options (the link's file route serves only these). */
export async function presentationModelIds(db: Db, p: PresentationRow): Promise<string[]> {
  const shown = await listShownOptions(db, [p.id]);
  return [...new Set(shown.flatMap((s) => placedModelIds(optionDocSchema.parse(withoutNonWebLinks(s.doc)))))];
}

/** A ready model as the client's page draws it, its file behind the link's route. */
export function toClientModel(row: PieceModelRow, piece: Piece, token: string): ClientModel {
  const s = row.scale;
  const min = (Array.isArray(row.min_mm) ? row.min_mm : [0, 0, 0]) as number[];
  return {
    url: linkFileUrl(token, fileUrl(row.model_key!)),
    sizeMm: { widthMm: row.width_mm! * s, depthMm: row.depth_mm! * s, heightMm: row.height_mm! * s },
    minMm: [min[0] * s, min[1] * s, min[2] * s],
    turnDeg: modelTurnSchema.parse(row.turn_deg),
    wearsFinishes: piece.modelWearsFinishes === true,
  };
}

/** `/api/files/<name>` as the link's own route, so the client loads textures without an account. */
export function linkFileUrl(token: string, url: string): string {
  return url.replace(/^\/api\/files\//, `/api/p/${encodeURIComponent(token)}/files/`);
}

/** What one option's surfaces and placed pieces wear in 3D, large textures behind the link's file route. */
export function clientSurfaces(doc: OptionDoc, finishes: ReadonlyMap<string, Finish>, token: string): ClientSurfaces {
  return optionSurfaces(doc, finishes, { size: 'large', textureUrl: (url) => linkFileUrl(token, url) });
}

/** Everything the client's page shows, and nothing else; `token` is the link's, for its file URLs. */
export async function clientPresentation(db: Db, p: PresentationRow, token: string): Promise<ClientPresentation> {
  const [studio, money, project, shown, choices] = await Promise.all([
    studioName(db, p.studio_id),
    studioMoney(db, p.studio_id),
    projectForPresentation(db, p.studio_id, p.project_id),
    listShownOptions(db, [p.id]),
    listChoices(db, [p.id]),
  ]);
  if (!project) throw linkNotFound();
  const grouped = groupByRoom(shown);
  const docs = new Map(shown.map((s) => [s.option_id, optionDocSchema.parse(withoutNonWebLinks(s.doc))]));
  // Holding-area pieces are the designer's working space, not part of the proposal.
  const placed = (id: string) => docs.get(id)!.pieces.filter((piece) => piece.placed);
  const finishIds = [
    ...new Set(
      shown
        .flatMap((s) => placed(s.option_id).map((piece) => piece.finishId))
        .filter((id): id is string => Boolean(id && isUuid(id))),
    ),
  ];
  const surfaceIds = [...new Set(shown.flatMap((s) => linkFinishIds(docs.get(s.option_id)!)))];
  const [labels, rows] = await Promise.all([finishLabels(db, p.studio_id, finishIds), finishRows(db, p.studio_id, surfaceIds)]);
  const finishes = new Map(labels.map((f) => [f.id, { name: f.name, colourHex: f.colour_hex }]));
  const sceneFinishes = new Map((await toFinishes(db, rows)).map((f) => [f.id, f]));
  const modelIds = shown.flatMap((s) => placedModelIds(docs.get(s.option_id)!));
  const models = new Map((await readyModelsByIds(db, p.studio_id, modelIds)).map((m) => [m.id, m]));
  const clientPiece = (piece: Piece): ClientPiece => {
    const out = toClientPiece(piece, p.show_prices, finishes);
    const model = piece.modelId ? models.get(piece.modelId) : undefined;
    if (model) out.model = toClientModel(model, piece, token);
    return out;
  };

  const rooms: ClientRoom[] = grouped.map((room) => {
    const choice = choices.find((c) => c.room_id === room.roomId);
    return {
      id: room.roomId,
      name: room.name,
      shell: roomShellSchema.parse(room.shell),
      options: room.options.map((o, i) => ({
        id: o.option_id,
        label: optionLabel(i, o.option_name),
        name: o.option_name,
        note: o.note,
        pieces: placed(o.option_id).map(clientPiece),
        surfaces: clientSurfaces(docs.get(o.option_id)!, sceneFinishes, token),
        version: o.option_version,
        sentVersion: o.sent_version,
      })),
      choice: choice ? toChoice(choice) : null,
    };
  });
  return {
    studioName: studio,
    projectName: project.name,
    message: p.message,
    showPrices: p.show_prices,
    expiresAt: p.expires_at.toISOString(),
    decided: project.state === 'decided',
    currency: money.currency,
    locale: money.locale,
    rooms,
  };
}

// The designer's side: make a presentation, send it, withdraw or extend it, and confirm the
// client's choices ("Mark as decided"). Each takes the caller's studio and the parsed input.

const DAY_MS = 86_400_000;

type DesignerServices = Pick<AppServices, 'db' | 'config' | 'links'>;

async function projectOrThrow(db: Db, studioId: string, projectId: string) {
  return orNotFound(await projectForPresentation(db, studioId, projectId), 'That project');
}

async function presentationOrThrow(db: Db, studioId: string, id: string) {
  return orNotFound(await getPresentation(db, studioId, id), 'That presentation');
}

/** The summaries as this caller sees them, with the names of the members who made them. */
async function callerSummaries(
  services: Pick<AppServices, 'db' | 'config'>,
  caller: Caller,
  rows: PresentationRow[],
): Promise<PresentationSummary[]> {
  const members = await listMembers(services.db, caller.studioId);
  return presentationSummaries(services.db, services.config, rows, {
    // The link opens the client's page and lets its holder choose, so viewers do not get it.
    withLinks: WRITERS.includes(caller.role),
    memberNames: new Map(members.map((m) => [m.id, m.name])),
  });
}

const callerSummary = async (services: Pick<AppServices, 'db' | 'config'>, caller: Caller, row: PresentationRow) =>
  (await callerSummaries(services, caller, [row]))[0];

/** Every room must be the project's, every option that room's; names the first field that is not. */
async function assertShownRoomsBelong(
  db: Db,
  studioId: string,
  projectId: string,
  rooms: { roomId: string; optionIds: string[] }[],
) {
  const rows = await roomsWithOptions(
    db,
    studioId,
    projectId,
    rooms.map((r) => r.roomId),
  );
  const fields: Record<string, string> = {};
  rooms.forEach((room, i) => {
    const mine = rows.filter((r) => r.room_id === room.roomId);
    if (mine.length === 0) fields[`rooms[${i}].roomId`] = 'Not a room of this project.';
    else if (!room.optionIds.every((id) => mine.some((r) => r.option_id === id)))
      fields[`rooms[${i}].optionIds`] = 'Pick options of this room only.';
  });
  const first = Object.values(fields)[0];
  if (first) throw new HttpError(400, 'invalid', first, fields);
}

const refuseUnlessActive = (p: PresentationRow, doing: string) => {
  const state = presentationState(p);
  if (state === 'withdrawn')
    throw new HttpError(409, 'withdrawn', `This link was withdrawn, so it cannot be ${doing}. Make a new presentation instead.`);
  if (state === 'expired') throw new HttpError(409, 'expired', `This link has expired. Extend it before it is ${doing}.`);
};

/** The project's presentations, newest first, with the visits counted so far. */
export async function listProjectPresentations(
  services: DesignerServices,
  caller: Caller,
  projectId: string,
): Promise<PresentationSummary[]> {
  await projectOrThrow(services.db, caller.studioId, projectId);
  await services.links.flushOpens();
  return callerSummaries(services, caller, await listPresentations(services.db, caller.studioId, projectId));
}

/** Makes a presentation of the project; a draft project is now with the client. */
export async function createPresentation(
  services: Pick<AppServices, 'db' | 'config'>,
  caller: Caller,
  projectId: string,
  body: z.output<typeof createPresentationSchema>,
): Promise<PresentationSummary> {
  const row = await services.db.transaction().execute(async (trx) => {
    const project = orNotFound(await lockProjectState(trx, caller.studioId, projectId), 'That project');
    if (project.state === 'archived')
      throw new HttpError(409, 'archived', 'This project is archived. Restore it before presenting it.');
    if (project.state === 'decided') throw decidedRefusal(DECIDED_REOPEN_FIRST);
    await assertShownRoomsBelong(trx, caller.studioId, projectId, body.rooms);
    const issuedAt = toTokenTime(new Date());
    const created = await insertPresentation(trx, {
      studioId: caller.studioId,
      projectId,
      createdBy: caller.memberId,
      tokenId: newTokenId(),
      message: body.message,
      showPrices: body.showPrices,
      issuedAt,
      tokenExpiresAt: new Date(issuedAt.getTime() + LINK_LIFETIME_DAYS * DAY_MS),
      expiresAt: new Date(issuedAt.getTime() + body.expiresInDays * DAY_MS),
    });
    await insertShownRooms(trx, created.id, body.rooms);
    // A link made is a link shared (sent or copied): the project is now with the client.
    if (project.state === 'draft') await setProjectState(trx, projectId, 'presented');
    return created;
  });
  return callerSummary(services, caller, row);
}

/**
 * E-mails the link to the client (or `body.to`), within the studio's and the recipient's mail
 * limits (a refusal over a limit is a 429 with Retry-After).
 */
export async function sendPresentation(
  services: Pick<AppServices, 'db' | 'config' | 'mailer'>,
  log: Logger,
  caller: Caller,
  id: string,
  body: z.output<typeof sendPresentationSchema>,
): Promise<PresentationSummary> {
  const { db, config } = services;
  const p = await presentationOrThrow(db, caller.studioId, id);
  refuseUnlessActive(p, 'sent');
  const project = await projectOrThrow(db, caller.studioId, p.project_id);
  const to = body.to ?? project.client_email;
  if (!to)
    throw new HttpError(400, 'invalid', 'The client has no e-mail address. Type one here, or copy the link instead.', {
      to: 'Enter the client’s e-mail.',
    });
  await limitPresentationMail(db, { id: caller.studioId, createdAt: await studioCreatedAt(db, caller.studioId) }, to);
  const mail = presentationMail({
    to,
    studio: await studioName(db, caller.studioId),
    project: project.name,
    clientName: project.client_name,
    message: p.message,
    link: await presentationLink(config, p),
    expiresAt: p.expires_at,
  });
  // Sent last inside the transaction: a refused mail leaves nothing marked sent.
  const sent = await db.transaction().execute(async (trx) => {
    const saved = await updatePresentation(trx, p.id, { sent_at: new Date(), sent_to: to });
    if (project.state === 'draft') await setProjectState(trx, project.id, 'presented');
    await sendStudioMail(
      trx,
      { ...services, log },
      { studioId: caller.studioId, kind: 'presentation', ...mail },
      'The e-mail could not be sent. Try again in a moment, or copy the link instead.',
    );
    return saved;
  });
  return callerSummary(services, caller, sent);
}

/** Stops the link at once. Withdrawing twice keeps the first time: that is when the link stopped working. */
export async function withdrawPresentation(services: DesignerServices, caller: Caller, id: string): Promise<PresentationSummary> {
  const p = await presentationOrThrow(services.db, caller.studioId, id);
  const saved = p.withdrawn_at ? p : await updatePresentation(services.db, p.id, { withdrawn_at: new Date() });
  services.links.forgetPresentation(p.id);
  return callerSummary(services, caller, saved);
}

/** Gives the link `days` more, never past the latest its token allows. */
export async function extendPresentation(
  services: DesignerServices,
  caller: Caller,
  id: string,
  days: number,
): Promise<PresentationSummary> {
  const p = await presentationOrThrow(services.db, caller.studioId, id);
  if (p.withdrawn_at)
    throw new HttpError(409, 'withdrawn', 'This link was withdrawn, so it cannot be extended. Make a new presentation instead.');
  const latest = p.token_expires_at.getTime();
  if (p.expires_at.getTime() >= latest) {
    throw new HttpError(
      409,
      'at_latest',
      `A link works for at most ${LINK_LIFETIME_DAYS} days. Make a new presentation to keep going.`,
    );
  }
  // From today when it has already run out, so extending an expired link opens it again.
  const from = Math.max(Date.now(), p.expires_at.getTime());
  const saved = await updatePresentation(services.db, p.id, {
    expires_at: new Date(Math.min(from + days * DAY_MS, latest)),
  });
  services.links.forgetPresentation(p.id);
  return callerSummary(services, caller, saved);
}

/**
 * "Mark as decided": the presentation's choices, one in every room, become the project's. Asking
 * twice for the same decision changes nothing; another needs Reopen first.
 */
export async function decideProject(
  services: DesignerServices,
  caller: Caller,
  projectId: string,
  presentationId: string,
): Promise<PresentationSummary> {
  const saved = await services.db.transaction().execute(async (trx) => {
    // The presentation's row before the project's, in the order a client's choice takes them.
    const p = await getPresentation(trx, caller.studioId, presentationId, { forUpdate: true });
    const project = orNotFound(await lockProjectState(trx, caller.studioId, projectId), 'That project');
    if (!p || p.project_id !== projectId) throw notFound('That presentation');
    if (project.state === 'archived') throw new HttpError(409, 'archived', 'This project is archived. Restore it first.');
    if (project.state === 'decided') {
      if (p.decided_at && p.decided_at.getTime() === (await latestDecision(trx, projectId))?.getTime()) return p;
      throw decidedRefusal('This project is already decided. Reopen the project first to decide it again.');
    }
    if (p.withdrawn_at)
      throw new HttpError(409, 'withdrawn', 'This presentation was withdrawn; its choices cannot decide the project.');
    const [summary] = await presentationSummaries(trx, services.config, [p], {
      withLinks: false,
      memberNames: new Map(),
    });
    if (!summary.complete)
      throw new HttpError(409, 'incomplete', 'Every room in this presentation needs a choice before the project is decided.');
    await setProjectState(trx, projectId, 'decided');
    return updatePresentation(trx, p.id, { decided_at: new Date() });
  });
  services.links.forgetPresentation(saved.id);
  return callerSummary(services, caller, saved);
}
