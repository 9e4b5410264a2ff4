// What a presentation shows and to whom: the designer's summary, the client's payload (only the
// chosen rooms and options, prices only when shown), the link, and the e-mails.
import type { AppConfig } from '../../config';
import type { Db } from '../../db/database';
import { HttpError } from '../../http/errors';
import { optionDocSchema, withoutNonWebLinks, type OptionDoc, type Piece } from '../../../shared/schemas/option';
import { toSceneFinish, type SceneFinish } from '../../../shared/finishes/scene-finish';
import type { Finish } from '../../../shared/schemas/finish';
import { roomShellSchema } from '../../../shared/schemas/room';
import { optionLabel } from '../../../shared/schemas/room-api';
import type {
  Choice,
  ClientPiece,
  ClientPresentation,
  ClientRoom,
  ClientSurfaces,
  PresentationState,
  PresentationSummary,
} from '../../../shared/schemas/presentation';
import { toFinishes } from '../finishes/finishes.service';
import { studioMoney } from '../studio/studio.repository';
import { signPresentationToken, verifyPresentationToken } from '../../services/tokens/presentation-token';
import { escapeHtml } from '../../services/mail/escape-html';
import {
  finishLabels,
  finishRows,
  findByTokenId,
  listChoices,
  listShownOptions,
  projectForPresentation,
  studioName,
  type PresentationRow,
} from './presentations.repository';

/** Choice posts per link per window: plenty for a family changing its mind, too few to flood the designer's inbox. */
export const CHOICE_LIMIT = 20;
/** "Looked at" posts per link per window: one per option shown, with room for a long evening. */
export const VIEW_LIMIT = 300;
export const RATE_WINDOW_MS = 10 * 60_000;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

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

/** Every finish id an option shows: its floor, ceiling, walls, feature walls and placed pieces. */
export function finishIdsOf(doc: OptionDoc): string[] {
  const { floor, ceiling, walls, wallOverrides } = doc.finishes;
  const ids = [
    floor,
    ceiling,
    walls,
    ...Object.values(wallOverrides),
    ...doc.pieces.filter((p) => p.placed).flatMap((p) => [p.finishId, p.accentFinishId]),
  ];
  return [...new Set(ids.filter((id): id is string => Boolean(id && UUID.test(id))))];
}

/** The finish ids the shown options of a presentation use: the finishes whose files its link may load. */
export async function presentationFinishIds(db: Db, p: PresentationRow): Promise<string[]> {
  const shown = await listShownOptions(db, [p.id]);
  return [...new Set(shown.flatMap((s) => finishIdsOf(optionDocSchema.parse(withoutNonWebLinks(s.doc)))))];
}

/** `/api/files/<name>` as the link's own route, so the client loads textures without an account. */
export function linkFileUrl(token: string, url: string): string {
  return url.replace(/^\/api\/files\//, `/api/p/${encodeURIComponent(token)}/files/`);
}

/** What one option's surfaces and pieces wear in 3D, with textures behind the link's file route. */
export function clientSurfaces(doc: OptionDoc, finishes: ReadonlyMap<string, Finish>, token: string): ClientSurfaces {
  const scene = (id: string | null | undefined): SceneFinish | null => {
    const finish = id ? finishes.get(id) : undefined;
    if (!finish) return null;
    const s = toSceneFinish(finish, { size: 'large' });
    return s.kind === 'photo' ? { ...s, textureUrl: linkFileUrl(token, s.textureUrl) } : s;
  };
  const wallOverrides: Record<string, SceneFinish> = {};
  for (const [wall, id] of Object.entries(doc.finishes.wallOverrides)) {
    const f = scene(id);
    if (f) wallOverrides[wall] = f;
  }
  const pieces: Record<string, SceneFinish> = {};
  const pieceAccents: Record<string, SceneFinish> = {};
  for (const piece of doc.pieces) {
    if (!piece.placed) continue;
    const main = scene(piece.finishId);
    if (main) pieces[piece.id] = main;
    const accent = scene(piece.accentFinishId);
    if (accent) pieceAccents[piece.id] = accent;
  }
  return {
    floor: scene(doc.finishes.floor),
    ceiling: scene(doc.finishes.ceiling),
    walls: scene(doc.finishes.walls),
    wallOverrides,
    pieces,
    pieceAccents,
  };
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
        .filter((id): id is string => Boolean(id && UUID.test(id))),
    ),
  ];
  const surfaceIds = [...new Set(shown.flatMap((s) => finishIdsOf(docs.get(s.option_id)!)))];
  const [labels, rows] = await Promise.all([finishLabels(db, p.studio_id, finishIds), finishRows(db, p.studio_id, surfaceIds)]);
  const finishes = new Map(labels.map((f) => [f.id, { name: f.name, colourHex: f.colour_hex }]));
  const sceneFinishes = new Map((await toFinishes(db, rows)).map((f) => [f.id, f]));

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
        pieces: placed(o.option_id).map((piece) => toClientPiece(piece, p.show_prices, finishes)),
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

export const dateText = (d: Date) =>
  new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric' }).format(d);

/** The client's e-mail with the link. */
export function invitationMail(v: {
  to: string;
  studio: string;
  project: string;
  clientName: string;
  message: string;
  link: string;
  expiresAt: Date;
}) {
  const until = dateText(v.expiresAt);
  // The designer's own message carries their greeting; only without one does the mail greet for them.
  const message = v.message ? `${v.message}\n\n` : `Hello ${v.clientName},\n\n`;
  return {
    to: v.to,
    subject: `${v.studio}: your options for ${v.project}`,
    text: `${message}Walk round each option in 3D and choose one per room:\n${v.link}\n\nThe link works until ${until}. No account or password is needed.\n\n${v.studio}`,
    html:
      (v.message ? `<p style="white-space:pre-wrap">${escapeHtml(v.message)}</p>` : `<p>Hello ${escapeHtml(v.clientName)},</p>`) +
      `<p><a href="${escapeHtml(v.link)}">Walk round each option in 3D and choose one per room</a></p>` +
      `<p>The link works until ${until}. No account or password is needed.</p><p>${escapeHtml(v.studio)}</p>`,
  };
}

/** The designer's e-mail when the client chooses. */
export function choiceMail(v: {
  to: string;
  clientName: string;
  project: string;
  room: string;
  option: string;
  comment: string;
  projectLink: string;
}) {
  const comment = v.comment ? `\n\nTheir comment: “${v.comment}”` : '';
  return {
    to: v.to,
    subject: `${v.clientName} chose ${v.option} for ${v.room} (${v.project})`,
    text: `${v.clientName} chose ${v.option} for ${v.room} in ${v.project}.${comment}\n\nSee the choices on the project: ${v.projectLink}`,
    html:
      `<p>${escapeHtml(v.clientName)} chose <strong>${escapeHtml(v.option)}</strong> for ${escapeHtml(v.room)} in ${escapeHtml(v.project)}.</p>` +
      (v.comment ? `<blockquote>${escapeHtml(v.comment)}</blockquote>` : '') +
      `<p><a href="${escapeHtml(v.projectLink)}">See the choices on the project</a></p>`,
  };
}
