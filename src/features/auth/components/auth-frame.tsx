// The two-column frame shared by the sign-in, sign-up and invitation pages.
import type { ReactNode } from 'react';
import { Link } from 'react-router';

/** The calm two-column frame of the sign-in, sign-up and invitation pages. */
export function AuthFrame({
  title,
  subtitle,
  children,
  footer,
}: {
  title: string;
  subtitle?: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}) {
  return (
    <div className="grid min-h-screen lg:grid-cols-[1fr_minmax(28rem,34rem)]">
      <aside className="relative hidden overflow-hidden bg-pine text-paper lg:flex lg:flex-col lg:justify-between lg:p-12">
        <Link to="/" className="text-2xl font-bold tracking-tight">
          Parlour
        </Link>
        <div className="max-w-md">
          <p className="text-3xl leading-snug font-semibold">From a tape measure to a decision.</p>
          <p className="mt-4 text-paper/85">
            Rebuild the room true to size, furnish it in two or three options, check that everything fits, and let your client
            walk round each one before choosing.
          </p>
        </div>
        <PlanSketch />
      </aside>
      <main className="flex items-center justify-center px-6 py-12">
        <div className="w-full max-w-sm">
          <div className="mb-8 lg:hidden">
            <span className="text-2xl font-bold tracking-tight text-pine">Parlour</span>
          </div>
          <h1 className="text-[26px] font-bold tracking-tight">{title}</h1>
          {subtitle && <p className="mt-2 text-ink-soft">{subtitle}</p>}
          <div className="mt-8">{children}</div>
          {footer && <div className="mt-8 text-sm text-ink-soft">{footer}</div>}
        </div>
      </main>
    </div>
  );
}

// A quiet line drawing of an L-shaped room with a door swing, to set the scene.
function PlanSketch() {
  return (
    <svg viewBox="0 0 320 200" className="w-full max-w-md opacity-70" aria-hidden>
      <path d="M20 20 H300 V110 H190 V180 H20 Z" fill="none" stroke="currentColor" strokeWidth="6" strokeLinejoin="miter" />
      <path d="M60 180 A40 40 0 0 1 100 140" fill="none" stroke="currentColor" strokeWidth="1.5" strokeDasharray="4 4" />
      <line x1="100" y1="180" x2="100" y2="140" stroke="currentColor" strokeWidth="2" />
      <rect x="40" y="40" width="110" height="40" rx="6" fill="none" stroke="currentColor" strokeWidth="2" />
      <rect x="70" y="95" width="50" height="28" rx="4" fill="none" stroke="currentColor" strokeWidth="2" />
      <rect x="210" y="40" width="70" height="50" rx="6" fill="none" stroke="currentColor" strokeWidth="2" />
    </svg>
  );
}
