import { SelectField } from '@client/components/ui/select';
import type { ClubMember } from '../api/club';

/** Mentors who could take someone on, with their load; full ones stay visible but cannot be picked. */
export function mentorOptions(members: ClubMember[], exceptUserId: string) {
  return members
    .filter((m) => m.role !== 'member' && m.status === 'active' && m.userId !== exceptUserId)
    .map((m) => {
      const load = m.menteeCount ?? 0;
      const capacity = m.mentorCapacity ?? 0;
      const full = load >= capacity;
      return {
        userId: m.userId,
        full,
        label: `${m.displayName} — ${load} of ${capacity} mentees${full ? ' (full)' : ''}`,
      };
    });
}

export function MentorSelect(p: {
  id: string;
  label: string;
  value: string;
  onChange(v: string): void;
  options: ReturnType<typeof mentorOptions>;
  placeholder: string;
}) {
  return (
    <SelectField id={p.id} label={p.label} value={p.value} onChange={(e) => p.onChange(e.target.value)}>
      <option value="">{p.placeholder}</option>
      {p.options.map((o) => (
        <option key={o.userId} value={o.userId} disabled={o.full}>
          {o.label}
        </option>
      ))}
    </SelectField>
  );
}
