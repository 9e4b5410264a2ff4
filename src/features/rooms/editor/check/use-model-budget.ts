// The Check step's estimate of how heavy an option's piece models make the client's walk-through:
// the shell and the other pieces' forms as the views draw them, plus each worn ready model's stored
// triangles and materials (shared/analysis/model-budget.ts). Nothing is built for an option
// without models; the forms come from the forms' own cache, which the preview has filled.
import { useMemo } from 'react';
import { formFigures, modelBudget, shellFigures, type ModelBudget } from '../../../../../shared/analysis/model-budget';
import type { OptionSurfaces } from '../../../../../shared/finishes/option-surfaces';
import { buildPieceForms } from '../../../../../shared/geometry/forms/piece-forms';
import { buildShellScene } from '../../../../../shared/geometry/scene';
import type { Piece } from '../../../../../shared/schemas/option';
import type { PieceModel } from '../../../../../shared/schemas/piece-model';
import type { RoomShell } from '../../../../../shared/schemas/room';

/** The estimate for the option's placed pieces, or null when none wears a ready model (or the room cannot be built yet). */
export function useModelBudget(
  shell: RoomShell,
  pieces: readonly Piece[],
  models: ReadonlyMap<string, PieceModel>,
  finishes: Partial<Pick<OptionSurfaces, 'pieces' | 'pieceAccents'>>,
): ModelBudget | null {
  const worn = useMemo(() => {
    const placed = pieces.filter((p) => p.placed);
    const wearing = new Map<string, PieceModel>();
    for (const p of placed) {
      const m = p.modelId ? models.get(p.modelId) : undefined;
      if (m && m.status === 'ready' && m.modelUrl && m.triangles !== null) wearing.set(p.id, m);
    }
    return { placed, wearing };
  }, [pieces, models]);
  const hasModels = worn.wearing.size > 0;
  const shellCost = useMemo(
    () => (hasModels ? attempt(() => shellFigures(buildShellScene(shell), shell)) : null),
    [shell, hasModels],
  );
  return useMemo(() => {
    if (!shellCost || worn.wearing.size === 0) return null;
    const formed = worn.placed.filter((p) => !worn.wearing.has(p.id));
    const forms = attempt(() => formFigures(buildPieceForms(formed), formed, finishes));
    if (!forms) return null;
    const wornFigures = [...worn.wearing.values()].map((m) => ({ triangles: m.triangles ?? 0, materials: m.materials ?? 1 }));
    return modelBudget(
      { drawCalls: shellCost.drawCalls + forms.drawCalls, triangles: shellCost.triangles + forms.triangles },
      wornFigures,
    );
  }, [shellCost, worn, finishes]);
}

// A shell mid-edit can break a rule the geometry relies on: no estimate then (the check says what is wrong).
function attempt<T>(build: () => T): T | null {
  try {
    return build();
  } catch {
    return null;
  }
}
