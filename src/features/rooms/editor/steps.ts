/** The room editor's steps, in the order a designer works. */
export const EDITOR_STEPS = [
  { id: 'outline', label: 'Outline', hint: 'Walls, corners and ceiling height' },
  { id: 'openings', label: 'Openings', hint: 'Doors, windows and passages' },
  { id: 'furnish', label: 'Furnish', hint: 'Pieces from the catalogue and the holding area' },
  { id: 'finishes', label: 'Finishes', hint: 'Floor, walls, ceiling and pieces' },
  { id: 'check', label: 'Check', hint: 'What does not fit, and room to move' },
] as const;

export type EditorStep = (typeof EDITOR_STEPS)[number]['id'];
