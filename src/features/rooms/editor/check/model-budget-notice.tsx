// The Check step's word on the option's piece models: how heavy they make the client's walk-through,
// a calm warning when they pass the budget for a room with models, a quiet line while they stay within.
import type { ModelBudget } from '../../../../../shared/analysis/model-budget';
import { MODEL_BUDGET } from '../../../../../shared/schemas/piece-model';
import { Notice } from '../../../../components/ui/layout';
import { formatCount } from '../../../../lib/format';

/** Triangles are said to the nearest hundred (or thousand past 10,000): the figure is an estimate. */
function about(triangles: number): string {
  const step = triangles >= 10_000 ? 1000 : 100;
  return formatCount(Math.max(step, Math.round(triangles / step) * step));
}

/** The sentence for an option over the budget, naming only the figures that pass it. */
export function heavyModelsText(budget: ModelBudget): string {
  const over: string[] = [];
  if (budget.overTriangles)
    over.push(`about ${about(budget.triangles)} triangles (keep under ${formatCount(MODEL_BUDGET.triangles)})`);
  if (budget.overDrawCalls)
    over.push(
      `about ${formatCount(budget.drawCalls)} separate parts to draw in each picture (keep under ${formatCount(MODEL_BUDGET.drawCalls)})`,
    );
  return `The models in this option are heavy for a client’s laptop: ${over.join(' and ')}. The walk-through may stutter. Choose lighter models, or let some pieces show their drawn form.`;
}

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
