// The Check step's count in the step bar: open findings in the warning colour, the ones marked as seen
// counted apart in a quiet one.

/** How many findings are open and how many are seen; nothing when there are none. */
export function FindingsBadge({ open, seen }: { open: number; seen: number }) {
  if (open === 0 && seen === 0) return null;
  const label = `${open} open ${open === 1 ? 'finding' : 'findings'}${seen > 0 ? `, ${seen} seen` : ''}`;
  return (
    <span className="ml-auto flex items-center gap-1" role="img" aria-label={label} data-testid="findings-badge">
      {open > 0 && <span className="rounded-full bg-clay px-1.5 text-xs text-white">{open}</span>}
      {seen > 0 && <span className="rounded-full bg-line px-1.5 text-xs font-semibold text-ink-soft">{seen} seen</span>}
    </span>
  );
}
