// The estimate of an option's client view with piece models: the shell and the forms of the pieces
// that wear none, counted as the views group them, plus the worn models. Loaded only when an option
// wears a model, so the room's scene builder stays out of the editor's first download.
import {
  formFigures,
  modelBudget,
  shellFigures,
  type FormFinishes,
  type ModelBudget,
  type WornModelFigures,
} from '../../../../../shared/analysis/model-budget';
import { buildPieceForms } from '../../../../../shared/geometry/forms/piece-forms';
import { buildShellScene } from '../../../../../shared/geometry/scene';
import type { Piece } from '../../../../../shared/schemas/option';
import type { RoomShell } from '../../../../../shared/schemas/room';

/**
 * The budget of an option drawn with `formed` pieces as forms and `worn` models (one per placed copy),
 * or null without models or when the room cannot be built yet (mid-edit).
 */
export function optionModelBudget(
  shell: RoomShell,
  formed: readonly Piece[],
  finishes: FormFinishes,
  worn: readonly WornModelFigures[],
): ModelBudget | null {
  try {
    const room = shellFigures(buildShellScene(shell), shell);
    const forms = formFigures(buildPieceForms(formed), formed, finishes);
    return modelBudget({ drawCalls: room.drawCalls + forms.drawCalls, triangles: room.triangles + forms.triangles }, worn);
  } catch {
    return null;
  }
}
