// The finish library page: the studio's finishes as cards, with search, category filter, photo
// upload and Add paint.
import { useDeferredValue, useState } from 'react';
import { Link } from 'react-router';
import { FINISH_CATEGORIES, type FinishListQuery } from '../../../../shared/schemas/finish';
import { Button } from '../../../components/ui/button';
import { EmptyState, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import { useCanEdit } from '../../../lib/session';
import { useFinishes, type Finish } from '../api/finishes';
import { AddPaintDialog } from './add-paint-dialog';
import { CATEGORY_LABELS, finishSummary, formatPrice } from './finish-labels';
import { useMoney } from '../../../lib/session';
import { PhotoUpload } from './photo-upload';
import { Swatch } from './swatch';
import { ListToolbar, ToolbarSelect } from '../../../components/ui/list-toolbar';

type Filter = 'all' | 'paint' | (typeof FINISH_CATEGORIES)[number];

const toQuery = (q: string, filter: Filter): Partial<FinishListQuery> => ({
  q: q.trim() || undefined,
  ...(filter === 'paint' ? { kind: 'paint' as const } : filter === 'all' ? {} : { category: filter }),
});

/** The studio's finishes: upload photos of samples, add paints, find one by name, supplier or code. */
export function FinishLibraryPage() {
  const canEdit = useCanEdit();
  const [q, setQ] = useState('');
  const [filter, setFilter] = useState<Filter>('all');
  const [addingPaint, setAddingPaint] = useState(false);
  const finishes = useFinishes(toQuery(useDeferredValue(q), filter));
  const filtered = q.trim() !== '' || filter !== 'all';

  return (
    <div>
      <PageHeader
        title="Finish library"
        actions={
          canEdit && (
            <Button variant="primary" onClick={() => setAddingPaint(true)}>
              Add paint
            </Button>
          )
        }
      >
        Floors, tiles, fabrics, wallpapers and paints from real samples, at their real size.
      </PageHeader>
      {canEdit && <PhotoUpload />}
      <ListToolbar
        className="mb-5"
        label="Search finishes"
        placeholder="Search by name, supplier or code"
        query={q}
        onQuery={setQ}
      >
        <ToolbarSelect
          label="Show"
          ariaLabel="Category"
          value={filter}
          onChange={setFilter}
          options={[
            { value: 'all', label: 'All finishes' },
            { value: 'paint', label: 'Paints' },
            ...FINISH_CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] })),
          ]}
        />
      </ListToolbar>
      {finishes.isPending ? (
        <Spinner label="Loading finishes…" />
      ) : finishes.isError ? (
        <Notice tone="error">{errorMessage(finishes.error)}</Notice>
      ) : finishes.data.finishes.length === 0 ? (
        <EmptyState title={filtered ? 'No finish matches that search.' : 'No finishes yet.'}>
          {!filtered && canEdit && 'Upload a photo of a sample above, or add a paint colour.'}
        </EmptyState>
      ) : (
        <ul className="grid grid-cols-2 gap-5 sm:grid-cols-3 lg:grid-cols-4" aria-label="Finishes">
          {finishes.data.finishes.map((f) => (
            <li key={f.id}>
              <FinishCard finish={f} />
            </li>
          ))}
        </ul>
      )}
      {addingPaint && <AddPaintDialog onClose={() => setAddingPaint(false)} />}
    </div>
  );
}

function FinishCard({ finish }: { finish: Finish }) {
  const money = useMoney();
  const price = formatPrice(finish, money);
  return (
    <Link
      to={`/finishes/${finish.id}`}
      className="group flex h-full flex-col gap-3 rounded-2xl border border-line bg-white p-3 transition-colors hover:border-line-strong"
    >
      <Swatch finish={finish} />
      <div className="min-w-0 px-1 pb-1">
        <div className="truncate font-semibold text-ink group-hover:underline" title={finish.name}>
          {finish.name}
        </div>
        <div className="truncate text-sm text-ink-soft">{finishSummary(finish)}</div>
        {(finish.supplier || price) && (
          <div className="mt-0.5 flex gap-2 text-sm text-ink-faint">
            {finish.supplier && (
              <span className="min-w-0 flex-1 truncate" title={finish.supplier}>
                {finish.supplier}
              </span>
            )}
            {price && <span className="ml-auto shrink-0 tabular-nums">{price}</span>}
          </div>
        )}
      </div>
    </Link>
  );
}
