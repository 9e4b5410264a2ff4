// How a project moves between its states, and the one way into each:
//   any state → archived                 Archive (PATCH state: archived)
//   archived  → the state it had before   Restore (PATCH state: that state)
//   draft     → presented                 making a presentation
//   presented → decided                   Mark as decided
//   decided   → presented                 Reopen, which records who and when
// PATCH takes only the first two; any other change it is asked for is refused, naming the way.
import type { ProjectState } from '../../../shared/schemas/project';
import { HttpError } from '../../http/errors';

export type KeptState = Exclude<ProjectState, 'archived'>;

export interface StateChange {
  state: ProjectState;
  previousState: KeptState | null;
}

const refused = (message: string) => new HttpError(409, 'state_change', message, { state: message });

/** What a PATCH asking for `wanted` does to a project now `current` (before `previous` when archived). */
export function patchStateChange(current: ProjectState, previous: KeptState | null, wanted: ProjectState): StateChange | null {
  if (wanted === current) return null;
  if (wanted === 'archived') return { state: 'archived', previousState: current as KeptState };
  if (current === 'archived') {
    const back = previous ?? 'draft';
    if (wanted === back) return { state: back, previousState: null };
    throw refused(`Restore brings this project back to “${back}”, the state it had before it was archived.`);
  }
  if (wanted === 'presented' && current === 'decided')
    throw refused('A decided project goes back to “presented” only by Reopen.');
  if (wanted === 'presented') throw refused('A project becomes “presented” when you make a presentation for it.');
  if (wanted === 'decided')
    throw refused('A project becomes “decided” by Mark as decided on a presentation whose rooms all have a choice.');
  throw refused('A project that has been presented does not go back to “draft”. Archive it instead.');
}

export const DECIDED_REOPEN_FIRST = 'This project is decided. Reopen the project first.';
export const CHOSEN_OPTION_FROZEN =
  'This option was chosen and the project is decided. Reopen the project or duplicate the option to change it.';

/** The 409 for a change that would alter a decided project's chosen options. */
export const decidedRefusal = (message: string) => new HttpError(409, 'decided', message);
