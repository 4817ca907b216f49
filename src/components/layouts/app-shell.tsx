import { useState, type ComponentType, type SVGProps } from 'react';
import { Navigate, NavLink, Outlet, useLocation, useNavigate } from 'react-router';
import { can, type Permission } from '@shared/auth/permissions';
import { paths } from '@/config/paths';
import { useLogout, useMe } from '@/lib/auth';
import { signOutEvenOffline } from '@/lib/sign-out';
import { useTranslation } from '@/lib/i18n';
import { IconAudit, IconBatch, IconDress, IconHome, IconMenu, IconOut, IconPeople, IconSettings } from '../ui/icons';
import { SearchBox } from './search-box';
import { Logo } from '../ui/logo';

export interface NavItem {
  to: string;
  /** English label; the menu shows `nav.<labelKey>` in the person's language when the key is given. */
  label: string;
  labelKey?: string;
  icon: ComponentType<SVGProps<SVGSVGElement>>;
  permission?: Permission;
}

/** The foundation's menu; feature areas add theirs through extraNav. */
export const NAV_ITEMS: NavItem[] = [
  { to: paths.home.getHref(), label: 'Today', labelKey: 'home', icon: IconHome },
  { to: paths.styles.getHref(), label: 'Styles', labelKey: 'styles', icon: IconDress, permission: 'styles:write' },
  { to: paths.batches.getHref(), label: 'Batches', labelKey: 'batches', icon: IconBatch, permission: 'batches:write' },
  { to: paths.people.getHref(), label: 'People', labelKey: 'people', icon: IconPeople, permission: 'people:manage' },
  { to: paths.settings.getHref(), label: 'Studio', labelKey: 'studio', icon: IconSettings, permission: 'studio:manage' },
  { to: paths.audit.getHref(), label: 'Audit trail', labelKey: 'audit', icon: IconAudit, permission: 'audit:read' },
];

export function AppShell({
  extraNav = [],
  signOutChecks = [],
}: {
  extraNav?: NavItem[];
  /** Feature checks run before signing out; each returns a warning (work still waiting on this device) or null. */
  signOutChecks?: ((userId: number) => string | null)[];
}) {
  const { data: me } = useMe();
  const { t } = useTranslation();
  const logout = useLogout();
  const navigate = useNavigate();
  const [open, setOpen] = useState(false);
  const [warnings, setWarnings] = useState<string[]>([]);
  const location = useLocation();
  const items = [...NAV_ITEMS.slice(0, 3), ...extraNav, ...NAV_ITEMS.slice(3)].filter((i) => !i.permission || can(me?.role, i.permission));

  const links = (
    <nav aria-label={t('nav.main')} className="flex flex-col gap-1">
      {items.map((i) => (
        <NavLink
          key={i.to}
          to={i.to}
          end={i.to === '/'}
          onClick={() => setOpen(false)}
          className={({ isActive }) =>
            `flex items-center gap-3 rounded-lg px-3 py-2 text-sm font-medium ${
              isActive ? 'bg-calico-50 text-thread-800' : 'text-calico-100 hover:bg-thread-800'
            }`
          }
        >
          <i.icon /> {i.labelKey ? t(`nav.${i.labelKey}`, { defaultValue: i.label }) : i.label}
        </NavLink>
      ))}
    </nav>
  );

  const signOut = async () => {
    setWarnings([]);
    await signOutEvenOffline(() => logout.mutateAsync());
    navigate(paths.signIn.getHref());
  };

  const handleSignOut = async () => {
    const pending = me ? signOutChecks.map((check) => check(me.id)).filter((w): w is string => Boolean(w)) : [];
    if (pending.length) {
      setOpen(false);
      return setWarnings(pending);
    }
    await signOut();
  };

  if (me?.mustChangePassword && location.pathname !== paths.account.getHref()) {
    return <Navigate to={paths.account.getHref()} replace />;
  }

  return (
    <div className="min-h-screen md:flex">
      <header className="app-shell flex items-center justify-between bg-thread-700 px-4 py-3 md:hidden">
        <span className="rounded-lg bg-calico-50 px-2 py-1"><Logo size={24} /></span>
        <button type="button" aria-label={t('nav.menu')} aria-expanded={open} aria-controls="main-menu" className="text-calico-50" onClick={() => setOpen((o) => !o)}>
          <IconMenu />
        </button>
      </header>
      <aside
        id="main-menu"
        className={`app-shell ${open ? 'block' : 'hidden'} bg-thread-700 px-3 py-4 md:flex md:w-60 md:flex-col md:justify-between md:min-h-screen`}
      >
        <div>
          <div className="mb-6 hidden rounded-lg bg-calico-50 px-3 py-2 md:block"><Logo /></div>
          {me && (me.role === 'owner' || me.role === 'cutter') ? <SearchBox onGo={() => setOpen(false)} /> : null}
          {links}
        </div>
        <div className="mt-6 border-t border-thread-600 pt-4 text-sm text-calico-100">
          <p className="font-medium">{me?.name}</p>
          <p className="text-xs opacity-80">
            {me ? t(`roles.${me.role}`) : ''} · {me?.studioName}
          </p>
          <div className="mt-3 flex gap-3">
            <NavLink to={paths.account.getHref()} className="underline" onClick={() => setOpen(false)}>
              {t('nav.account')}
            </NavLink>
            <button type="button" className="flex items-center gap-1 underline" onClick={handleSignOut}>
              <IconOut width={16} height={16} /> {t('nav.signOut')}
            </button>
          </div>
        </div>
      </aside>
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 sm:px-6">
        {warnings.length ? (
          <div role="alertdialog" aria-label={t('nav.beforeSignOut')} className="mb-4 rounded-lg bg-saffron-100 p-4 text-sm text-saffron-700">
            {warnings.map((w) => (
              <p key={w}>{w}</p>
            ))}
            <div className="mt-3 flex flex-wrap gap-2">
              <button type="button" className="btn-primary" onClick={() => void signOut()}>
                {t('nav.signOutKeep')}
              </button>
              <button type="button" className="btn-quiet" onClick={() => setWarnings([])}>
                {t('nav.staySignedIn')}
              </button>
            </div>
          </div>
        ) : null}
        <Outlet />
      </main>
    </div>
  );
}
