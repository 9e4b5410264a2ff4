// The designer's frame around every studio page: the top bar with Projects, Clients, Finish
// library, Models, Studio (and Outbox when present), the member's name and Sign out; plus the not-found page.
import { Link, NavLink, Navigate, Outlet, useLocation, useNavigate } from 'react-router';
import { Button } from '../components/ui/button';
import { Notice, Spinner } from '../components/ui/layout';
import { errorMessage } from '../lib/api';
import { useSession } from '../lib/session';
import { useSignOut } from '../features/auth/api/session';

const navClass = ({ isActive }: { isActive: boolean }) =>
  `rounded-lg px-3 py-2 text-[15px] font-semibold whitespace-nowrap transition-colors ${isActive ? 'bg-pine-wash text-pine-dark' : 'text-ink-soft hover:bg-sand hover:text-ink'}`;

/** The designer's frame: top bar with the studio's places, then the page. Signed-out visitors go to sign-in. */
export function DesignerLayout({ wide = false }: { wide?: boolean }) {
  const session = useSession();
  const location = useLocation();
  const signOut = useSignOut();
  const navigate = useNavigate();

  if (session.isPending)
    return (
      <div className="mx-auto max-w-6xl px-6">
        <Spinner />
      </div>
    );
  if (session.isError)
    return (
      <div className="mx-auto max-w-6xl px-6 py-10">
        <Notice tone="error">{errorMessage(session.error)}</Notice>
      </div>
    );
  if (!session.data) return <Navigate to={`/sign-in?next=${encodeURIComponent(location.pathname + location.search)}`} replace />;
  const { member, studio, outbox } = session.data;

  return (
    <div className="min-h-screen">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded-lg focus:bg-white focus:px-4 focus:py-2"
      >
        Skip to content
      </a>
      <header className="no-print border-b border-line bg-paper/95">
        <div className={`mx-auto flex h-16 items-center gap-3 px-4 sm:gap-6 sm:px-6 ${wide ? '' : 'max-w-6xl'}`}>
          <Link to="/projects" className="text-xl font-bold tracking-tight text-pine">
            Parlour
          </Link>
          <nav aria-label="Studio" className="flex min-w-0 items-center gap-1 overflow-x-auto">
            <NavLink to="/projects" className={navClass}>
              Projects
            </NavLink>
            <NavLink to="/clients" className={navClass}>
              Clients
            </NavLink>
            <NavLink to="/finishes" className={navClass}>
              Finish library
            </NavLink>
            <NavLink to="/models" className={navClass}>
              Models
            </NavLink>
            <NavLink to="/studio" className={navClass}>
              Studio
            </NavLink>
            {outbox && (
              <NavLink to="/outbox" className={navClass}>
                Outbox
              </NavLink>
            )}
          </nav>
          <div className="ml-auto flex items-center gap-3">
            <div className="hidden text-right leading-tight lg:block">
              <div className="text-sm font-semibold">{member.name}</div>
              <div className="text-xs text-ink-faint">
                {studio.name} · {member.role}
              </div>
            </div>
            <Button
              size="sm"
              variant="quiet"
              busy={signOut.isPending}
              onClick={() => signOut.mutate(undefined, { onSettled: () => navigate('/sign-in', { replace: true }) })}
            >
              Sign out
            </Button>
          </div>
        </div>
      </header>
      <main id="main" className={wide ? '' : 'mx-auto max-w-6xl px-6 py-10'}>
        <Outlet />
      </main>
    </div>
  );
}

export function NotFoundPage() {
  return (
    <div className="mx-auto flex min-h-[60vh] max-w-lg flex-col items-center justify-center gap-4 px-6 text-center">
      <h1 className="text-2xl font-bold">This page is not here.</h1>
      <p className="text-ink-soft">The link may be old, or the page may belong to another studio.</p>
      <Link to="/projects" className="font-semibold text-pine underline">
        Go to projects
      </Link>
    </div>
  );
}
