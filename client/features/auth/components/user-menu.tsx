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
        <label className="flex items-center gap-1 text-sm text-tide-100">
          <span className="sr-only">Club</span>
          <select
            value={activeClub?.clubId}
            onChange={(e) => setActiveClubId(e.target.value)}
            className="min-h-touch max-w-40 rounded-full border-0 bg-tide-700 px-3 text-sm font-bold text-white sm:max-w-56"
          >
            {clubs.map((c) => (
              <option key={c.clubId} value={c.clubId}>{c.clubName} · {ROLE_LABELS[c.role]}</option>
            ))}
          </select>
        </label>
      ) : activeClub ? (
        <span className="hidden text-sm font-bold text-tide-100 sm:inline">{activeClub.clubName}</span>
      ) : null}
      <details className="relative">
        <summary className="flex size-touch cursor-pointer list-none items-center justify-center rounded-full bg-tide-600 font-extrabold text-white" aria-label={`Account of ${me.user.displayName}`}>
          {me.user.displayName.slice(0, 1).toUpperCase()}
        </summary>
        <div className="absolute right-0 z-20 mt-2 w-56 rounded-card bg-white p-2 shadow-card ring-1 ring-tide-100">
          <p className="px-3 py-2 text-sm text-tide-700">
            Signed in as <strong className="block text-tide-900">{me.user.displayName}</strong>
          </p>
          <Link to="/profile" className="block rounded-lg px-3 py-2 font-bold text-tide-800 hover:bg-tide-50">Profile and units</Link>
          <button
            type="button"
            className="block w-full rounded-lg px-3 py-2 text-left font-bold text-tide-800 hover:bg-tide-50"
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
