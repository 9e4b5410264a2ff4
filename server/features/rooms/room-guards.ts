// The rooms feature's rules on what keeps a client's choice standing (rooms.service.ts applies
// them): a room or option that a presentation still shows is not deleted, nor one a client chose
// (choices are never deleted as a side effect), and while the project is decided its chosen
// options and their room's walls do not change.
import type { Db } from '../../db/database';
import { HttpError } from '../../http/errors';
import { CHOSEN_OPTION_FROZEN, decidedRefusal } from '../projects/project-states';
import { dateText } from '../../../shared/units/date-text';
import { decidedChoices, presentationsShowing, type Shown } from './rooms.repository';

type ShowingRow = Awaited<ReturnType<typeof presentationsShowing>>[number];

/** "the presentation made on 2 December 2026 for ada@example.com", as the project page lists it. */
export function presentationName(p: Pick<ShowingRow, 'created_at' | 'sent_to'>): string {
  return `the presentation made on ${dateText(p.created_at)}${p.sent_to ? ` for ${p.sent_to}` : ''}`;
}

const shownRefusal = (p: ShowingRow, what: string, others: number) =>
  new HttpError(
    409,
    'in_presentation',
    `This ${what} is shown in ${presentationName(p)}${others > 0 ? ` (and ${others} more)` : ''}. ` +
      `Withdraw that presentation first, then delete the ${what}.`,
    undefined,
    { presentationId: p.id },
  );

const chosenRefusal = (p: ShowingRow, what: 'room' | 'option') =>
  new HttpError(
    409,
    'in_presentation',
    `A client chose ${what === 'room' ? 'an option of this room' : 'this option'} in ${presentationName(p)} (withdrawn). ` +
      `Their choice is kept, so the ${what} cannot be deleted.`,
    undefined,
    { presentationId: p.id },
  );

/** Refuses deleting a room or option that a live presentation shows or a client chose. */
export async function assertDeletable(db: Db, studioId: string, of: Shown): Promise<void> {
  const what = 'roomId' in of ? 'room' : 'option';
  if ((await decidedChoices(db, studioId, of)).length > 0) {
    throw decidedRefusal(
      what === 'room'
        ? 'An option of this room was chosen and the project is decided. Reopen the project to delete the room.'
        : CHOSEN_OPTION_FROZEN,
    );
  }
  const rows = await presentationsShowing(db, studioId, of);
  const live = rows.filter((p) => !p.withdrawn_at);
  if (live.length > 0) throw shownRefusal(live[0], what, live.length - 1);
  const chosen = rows.find((p) => p.chosen);
  if (chosen) throw chosenRefusal(chosen, what);
}

/** Refuses changing an option the decided project stands on. */
export async function assertOptionEditable(db: Db, studioId: string, optionId: string): Promise<void> {
  if ((await decidedChoices(db, studioId, { optionId })).length > 0) throw decidedRefusal(CHOSEN_OPTION_FROZEN);
}

/** Refuses changing the walls, doors and windows around an option the decided project stands on. */
export async function assertShellEditable(db: Db, studioId: string, roomId: string): Promise<void> {
  if ((await decidedChoices(db, studioId, { roomId })).length > 0) {
    throw decidedRefusal(
      'An option of this room was chosen and the project is decided, so its outline and openings cannot change. Reopen the project to change them.',
    );
  }
}

/** PostgreSQL's answer when a delete would take a choice with it (migration 0009's foreign keys). */
function isChoiceKept(err: unknown): boolean {
  const e = err as { code?: unknown; constraint?: unknown } | null;
  return e?.code === '23503' && (e.constraint === 'choices_room_fk' || e.constraint === 'choices_option_fk');
}

const choiceKeptRefusal = (what: 'room' | 'option') =>
  new HttpError(
    409,
    'in_presentation',
    `A client chose ${what === 'room' ? 'an option of this room' : 'this option'} in a presentation. Their choice is kept, so the ${what} cannot be deleted.`,
  );

/** Runs a delete; the database's refusal to take a client's choice with it becomes a 409. */
export async function deleteKeepingChoices(what: 'room' | 'option', run: () => Promise<void>): Promise<void> {
  try {
    await run();
  } catch (err) {
    if (isChoiceKept(err)) throw choiceKeptRefusal(what);
    throw err;
  }
}
