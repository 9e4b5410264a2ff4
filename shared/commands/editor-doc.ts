// The editor document: one room's shell shared by all its options plus each option's pieces and
// finishes, and createEditorDoc to build one from stored room and option documents.
import { optionDocSchema, type OptionDoc, type OptionDocInput } from '../schemas/option';
import { roomShellSchema, type RoomShell, type RoomShellInput } from '../schemas/room';

/**
 * What the room editor edits: one room's shell (plan mm) shared by all its options, and each
 * option's pieces and finishes keyed by option id. Plain JSON, treated as immutable.
 */
export interface EditorDoc {
  readonly shell: RoomShell;
  readonly options: Readonly<Record<string, OptionDoc>>;
}

/** An editor document from stored (or hand-written) room and option documents, defaults filled in; throws a ZodError on a bad one. */
export function createEditorDoc(shell: RoomShellInput, options: Readonly<Record<string, OptionDocInput>> = {}): EditorDoc {
  const parsed: Record<string, OptionDoc> = {};
  for (const [optionId, option] of Object.entries(options)) parsed[optionId] = optionDocSchema.parse(option);
  return { shell: roomShellSchema.parse(shell), options: parsed };
}
