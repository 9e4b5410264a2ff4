// The finish command: assignFinish puts a finish from the finish library on an option's floor,
// ceiling, walls or one feature wall, or takes it off.
import type { FinishAssignments } from '../schemas/option';
import { checkWall, done, makeCommand, refuse, type Command } from './command';

/** Where an option's finish goes: the floor, the ceiling, every wall, or one wall (by index) as a feature wall. */
export type FinishSurface = 'floor' | 'ceiling' | 'walls' | { wall: number };

function surfaceWords(surface: FinishSurface): string {
  return typeof surface === 'object' ? `wall ${surface.wall}` : surface === 'walls' ? 'wall' : surface;
}

/** Puts a finish (by id from the finish library) on a surface of one option; null takes it off. */
export function assignFinish(optionId: string, surface: FinishSurface, finishId: string | null): Command {
  return makeCommand(
    'assignFinish',
    { optionId, surface, finishId },
    {
      label: (_doc, args) => `${args.finishId === null ? 'Clear' : 'Change'} ${surfaceWords(args.surface)} finish`,
      run: (doc, args) => {
        const option = doc.options[args.optionId];
        if (!option) return refuse(`there is no option ${args.optionId}`);
        if (args.finishId !== null && (typeof args.finishId !== 'string' || args.finishId === ''))
          return refuse('the finish needs an id');
        const { surface } = args;
        let finishes: FinishAssignments;
        if (typeof surface === 'object') {
          const bad = checkWall(doc.shell, surface.wall);
          if (bad) return refuse(bad);
          const wallOverrides = { ...option.finishes.wallOverrides };
          if (args.finishId === null) delete wallOverrides[String(surface.wall)];
          else wallOverrides[String(surface.wall)] = args.finishId;
          finishes = { ...option.finishes, wallOverrides };
        } else if (surface === 'floor' || surface === 'ceiling' || surface === 'walls') {
          finishes = { ...option.finishes, [surface]: args.finishId };
        } else {
          return refuse(`there is no surface ${String(surface)}`);
        }
        return done({ ...doc, options: { ...doc.options, [args.optionId]: { ...option, finishes } } });
      },
    },
  );
}
