import { Link, useNavigate } from 'react-router';
import { ROLE_LABELS } from '@shared/constants/roles';
import { useSignOut } from '../api/mutations';
import { useSession } from './session-provider';

/** Who is signed in, which club they are looking at (switchable), and sign-out. */
export function UserMenu() {
  const { me, activeClub, setActiveClubId } = useSession();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const clubs = me.memberships.filter((m) => m.status === 'active');
  return (
    <div className="flex items-center gap-2">
      {clubs.length > 1 ? (
        <label className="flex items-center gap-1 text-sm text-on-chrome-muted">
          <span className="sr-only">Club</span>
          <select
            value={activeClub?.clubId}
            onChange={(e) => setActiveClubId(e.target.value)}
            className="min-h-touch max-w-40 rounded-full border-0 bg-chrome-active px-3 text-sm font-bold text-on-chrome sm:max-w-56"
          >
            {clubs.map((c) => (
              <option key={c.clubId} value={c.clubId}>
                {c.clubName} · {ROLE_LABELS[c.role]}
              </option>
            ))}
          </select>
        </label>
      ) : activeClub ? (
        <span className="hidden text-sm font-bold text-on-chrome-muted sm:inline">{activeClub.clubName}</span>
      ) : null}
      <details className="relative">
        <summary
          className="flex size-touch cursor-pointer list-none items-center justify-center rounded-full bg-chrome-active font-extrabold text-on-chrome"
          aria-label={`Account of ${me.user.displayName}`}
        >
          {me.user.displayName.slice(0, 1).toUpperCase()}
        </summary>
        <div className="absolute right-0 z-20 mt-2 w-56 rounded-card bg-surface p-2 shadow-card ring-1 ring-line">
          <p className="px-3 py-2 text-sm text-ink-muted">
            Signed in as <strong className="block text-ink">{me.user.displayName}</strong>
          </p>
          <Link to="/profile" className="block rounded-lg px-3 py-2 font-bold text-ink-soft hover:bg-tint">
            Profile and units
          </Link>
          <button
            type="button"
            className="block w-full rounded-lg px-3 py-2 text-left font-bold text-ink-soft hover:bg-tint"
            onClick={async () => {
              await signOut.mutateAsync();
              navigate('/sign-in');
            }}
          >
            Sign out
          </button>
        </div>
      </details>
    </div>
  );
}
