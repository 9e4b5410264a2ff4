// Page building blocks shared across the app: page header, card, empty state, notice, spinner,
// and the badge that colours a project, presentation, role or piece state.
import type { ReactNode } from 'react';

export function PageHeader({
  title,
  eyebrow,
  actions,
  children,
}: {
  title: ReactNode;
  eyebrow?: ReactNode;
  actions?: ReactNode;
  children?: ReactNode;
}) {
  return (
    <header className="mb-8 flex flex-wrap items-end justify-between gap-4">
      <div className="min-w-0">
        {eyebrow && <div className="mb-1 text-sm font-medium text-ink-faint">{eyebrow}</div>}
        <h1 className="text-[28px] leading-tight font-bold tracking-tight text-ink">{title}</h1>
        {children && <div className="mt-2 text-ink-soft">{children}</div>}
      </div>
      {actions && <div className="flex flex-wrap items-center gap-2">{actions}</div>}
    </header>
  );
}

export function Card({
  children,
  className = '',
  title,
  actions,
}: {
  children: ReactNode;
  className?: string;
  title?: ReactNode;
  actions?: ReactNode;
}) {
  return (
    <section className={`rounded-2xl border border-line bg-white p-6 ${className}`}>
      {(title || actions) && (
        <div className="mb-4 flex items-center justify-between gap-3">
          {title && <h2 className="text-lg font-bold text-ink">{title}</h2>}
          {actions}
        </div>
      )}
      {children}
    </section>
  );
}

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="flex flex-col items-center rounded-xl border border-dashed border-line-strong bg-paper/60 px-6 py-10 text-center">
      <p className="font-semibold text-ink">{title}</p>
      {children && <p className="mt-1 max-w-md text-sm text-ink-soft">{children}</p>}
      {action && <div className="mt-4">{action}</div>}
    </div>
  );
}

export function Notice({ tone = 'info', children }: { tone?: 'info' | 'warn' | 'error' | 'ok'; children: ReactNode }) {
  const tones = {
    info: 'bg-sand text-ink',
    warn: 'bg-ochre-wash text-ochre',
    error: 'bg-clay-wash text-clay',
    ok: 'bg-pine-wash text-pine-dark',
  };
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`rounded-lg px-4 py-3 text-sm font-medium ${tones[tone]}`}>
      {children}
    </div>
  );
}

export function Spinner({ label = 'Loading…' }: { label?: string }) {
  return (
    <div className="flex items-center gap-3 py-10 text-ink-soft" role="status">
      <span className="size-4 animate-spin rounded-full border-2 border-pine border-t-transparent" aria-hidden />
      {label}
    </div>
  );
}

const STATE_STYLES: Record<string, string> = {
  draft: 'bg-sand text-ink-soft',
  presented: 'bg-ochre-wash text-ochre',
  decided: 'bg-pine-wash text-pine-dark',
  archived: 'bg-white text-ink-faint border border-line',
  active: 'bg-pine-wash text-pine-dark',
  expired: 'bg-sand text-ink-soft',
  withdrawn: 'bg-clay-wash text-clay',
  owner: 'bg-pine-wash text-pine-dark',
  designer: 'bg-sand text-ink',
  viewer: 'bg-white text-ink-soft border border-line',
  existing: 'bg-sand text-ink-soft',
  new: 'bg-pine-wash text-pine-dark',
};

export function Badge({ value, label }: { value: string; label?: string }) {
  return (
    <span
      className={`inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-semibold capitalize ${STATE_STYLES[value] ?? 'bg-sand text-ink'}`}
    >
      {label ?? value}
    </span>
  );
}
