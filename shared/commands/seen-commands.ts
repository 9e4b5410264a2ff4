// The seen commands of the room editor: mark a fit-check finding of one option as seen and intended,
// with a short note, or take the mark off again. Each is one undo step, saved with the option.
import { SEEN_LIMITS, seenMarkSchema, type SeenMark } from '../schemas/option';
import { done, firstIssue, makeCommand, refuse, type Command } from './command';
import type { EditorDoc } from './editor-doc';

/**
 * Marks the finding with `key` (findingKey) in an option as seen, with a note, at a time (ISO 8601,
 * passed in so the command stays pure). Marking it again changes its note and time. At the bound a
 * new mark pushes out the oldest one whose finding is not among `listedKeys` (the findings the check
 * lists now), so marks of findings that went away never lock the list; refused when every mark is listed.
 */
export function markSeen(optionId: string, key: string, note: string, at: string, listedKeys: readonly string[] = []): Command {
  return makeCommand(
    'markSeen',
    { optionId, key, note, at, listedKeys },
    {
      label: (doc, args) =>
        doc.options[args.optionId]?.seen.some((m) => m.key === args.key) ? 'Change seen note' : 'Mark as seen',
      run: (doc, args) => {
        const option = doc.options[args.optionId];
        if (!option) return refuse(`there is no option ${args.optionId}`);
        const parsed = seenMarkSchema.safeParse({ key: args.key, note: args.note, at: args.at });
        if (!parsed.success) return refuse(firstIssue(parsed.error));
        const mark: SeenMark = parsed.data;
        const index = option.seen.findIndex((m) => m.key === mark.key);
        let seen: SeenMark[];
        if (index >= 0) {
          seen = option.seen.slice();
          seen[index] = mark;
        } else if (option.seen.length < SEEN_LIMITS.marks) {
          seen = [...option.seen, mark];
        } else {
          const listed = new Set(args.listedKeys);
          const gone = option.seen.findIndex((m) => !listed.has(m.key));
          if (gone < 0) return refuse(`an option keeps at most ${SEEN_LIMITS.marks} seen marks`);
          seen = [...option.seen.slice(0, gone), ...option.seen.slice(gone + 1), mark];
        }
        return done(withSeen(doc, args.optionId, seen));
      },
    },
  );
}

/** Takes the seen mark off the finding with `key` in an option, so it counts as open again. */
export function unmarkSeen(optionId: string, key: string): Command {
  return makeCommand(
    'unmarkSeen',
    { optionId, key },
    {
      label: () => 'Unmark',
      run: (doc, args) => {
        const option = doc.options[args.optionId];
        if (!option) return refuse(`there is no option ${args.optionId}`);
        if (!option.seen.some((m) => m.key === args.key)) return refuse('that finding is not marked as seen');
        return done(
          withSeen(
            doc,
            args.optionId,
            option.seen.filter((m) => m.key !== args.key),
          ),
        );
      },
    },
  );
}

function withSeen(doc: EditorDoc, optionId: string, seen: SeenMark[]): EditorDoc {
  const option = doc.options[optionId]!;
  return { ...doc, options: { ...doc.options, [optionId]: { ...option, seen } } };
}
