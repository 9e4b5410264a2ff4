// The Check step's word on the option's piece models: how heavy they make the client's walk-through,
// a calm warning when they pass the budget for a room with models, a quiet line while they stay within.
import type { ModelBudget } from '../../../../../shared/analysis/model-budget';
import { Notice } from '../../../../components/ui/layout';
import { about, heavyModelsText } from './model-budget-words';

export function ModelBudgetNotice({ budget }: { budget: ModelBudget | null }) {
  if (!budget) return null;
  const figures = {
    'data-testid': 'model-budget',
    'data-triangles': budget.triangles,
    'data-draw-calls': budget.drawCalls,
  };
  if (budget.overTriangles || budget.overDrawCalls)
    return (
      <div {...figures} data-state="heavy">
        <Notice tone="warn">{heavyModelsText(budget)}</Notice>
      </div>
    );
  const count = budget.models === 1 ? 'The model in this option stays' : `The ${budget.models} models in this option stay`;
  return (
    <p {...figures} data-state="within" className="text-xs text-ink-faint">
      {count} light enough for a client’s laptop: about {about(budget.triangles)} triangles for the whole room.
    </p>
  );
}
