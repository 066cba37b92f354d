import type { ClubMember } from '../api/club';

/** Mentors who could take someone on, with their load; full ones stay visible but cannot be picked. */
export function mentorOptions(members: ClubMember[], exceptUserId: string) {
  return members
    .filter((m) => m.role !== 'member' && m.status === 'active' && m.userId !== exceptUserId)
    .map((m) => {
      const load = m.menteeCount ?? 0;
      const capacity = m.mentorCapacity ?? 0;
      const full = load >= capacity;
      return { userId: m.userId, full, label: `${m.displayName} — ${load} of ${capacity} mentees${full ? ' (full)' : ''}` };
    });
}

export function MentorSelect(p: { id: string; label: string; value: string; onChange(v: string): void; options: ReturnType<typeof mentorOptions>; placeholder: string }) {
  return (
    <div>
      <label htmlFor={p.id} className="block text-sm font-bold text-tide-800">{p.label}</label>
      <select
        id={p.id}
        value={p.value}
        onChange={(e) => p.onChange(e.target.value)}
        className="mt-1 block min-h-touch w-full rounded-xl border border-tide-200 bg-white px-3 text-base text-tide-950 shadow-sm focus:border-tide-500 focus:ring-2 focus:ring-tide-200 focus:outline-none"
      >
        <option value="">{p.placeholder}</option>
        {p.options.map((o) => (
          <option key={o.userId} value={o.userId} disabled={o.full}>{o.label}</option>
        ))}
      </select>
    </div>
  );
}
