// The words of the Check step's notice on piece models: the estimate's figures rounded as an
// estimate and grouped as the reader writes them, and the sentence for an option over the budget.
import type { ModelBudget } from '../../../../../shared/analysis/model-budget';
import { MODEL_BUDGET } from '../../../../../shared/schemas/piece-model';
import { formatCount } from '../../../../lib/format';

/** Triangles are said to the nearest hundred (or thousand past 10,000): the figure is an estimate. */
export function about(triangles: number): string {
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
