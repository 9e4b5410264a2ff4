// The Check step's estimate of how heavy an option's piece models make the client's walk-through:
// the shell and the other pieces' forms as the views draw them, plus each worn ready model's stored
// triangles and materials (room-figures.ts, loaded on first need; shared/analysis/model-budget.ts).
// Nothing is loaded or built for an option without models.
import { useEffect, useMemo, useState } from 'react';
import type { FormFinishes, ModelBudget } from '../../../../../shared/analysis/model-budget';
import type { Piece } from '../../../../../shared/schemas/option';
import type { PieceModel } from '../../../../../shared/schemas/piece-model';
import type { RoomShell } from '../../../../../shared/schemas/room';

/** The estimate for the option's placed pieces, or null when none wears a ready model (or the room cannot be built yet). */
export function useModelBudget(
  shell: RoomShell,
  pieces: readonly Piece[],
  models: ReadonlyMap<string, PieceModel>,
  finishes: FormFinishes,
): ModelBudget | null {
  const worn = useMemo(() => {
    const placed = pieces.filter((p) => p.placed);
    const wearing = new Map<string, PieceModel>();
    for (const p of placed) {
      const m = p.modelId ? models.get(p.modelId) : undefined;
      if (m && m.status === 'ready' && m.modelUrl && m.triangles !== null) wearing.set(p.id, m);
    }
    return { formed: placed.filter((p) => !wearing.has(p.id)), wearing };
  }, [pieces, models]);
  // The last answer stays shown while a newer layout's is worked out.
  const [budget, setBudget] = useState<ModelBudget | null>(null);
  useEffect(() => {
    if (worn.wearing.size === 0) return undefined;
    let live = true;
    const figures = [...worn.wearing.values()].map((m) => ({ triangles: m.triangles ?? 0, materials: m.materials ?? 1 }));
    void import('./room-figures').then(({ optionModelBudget }) => {
      if (live) setBudget(optionModelBudget(shell, worn.formed, finishes, figures));
    });
    return () => {
      live = false;
    };
  }, [shell, worn, finishes]);
  return worn.wearing.size > 0 ? budget : null;
}
