import { CLINIC_SLOT_MINUTES, type MeetupKind } from '@shared/constants/meetups';
import type { CreateMeetupInput, UpdateMeetupInput } from '@shared/schemas/meetup.schema';
import type { MeetupDetailView } from '@shared/schemas/meetup-views';

/** What the meetup form holds: strings, as the fields give them. */
export interface MeetupFormValues {
  kind: MeetupKind;
  title: string;
  description: string;
  startsAt: string;
  endsAt: string;
  placeText: string;
  mapUrl: string;
  onlineUrl: string;
  capacity: string;
  hostId: string;
  slotMinutes: string;
}

export const FORM_FIELDS = [
  'kind',
  'title',
  'description',
  'startsAt',
  'endsAt',
  'placeText',
  'mapUrl',
  'onlineUrl',
  'capacity',
  'hostId',
  'slotMinutes',
] as const;

export function blankMeetup(localNow: string): MeetupFormValues {
  const day = localNow.slice(0, 10);
  return {
    kind: 'talk',
    title: '',
    description: '',
    startsAt: `${day}T19:00`,
    endsAt: `${day}T21:00`,
    placeText: '',
    mapUrl: '',
    onlineUrl: '',
    capacity: '30',
    hostId: '',
    slotMinutes: String(CLINIC_SLOT_MINUTES.default),
  };
}

export function valuesOf(m: MeetupDetailView): MeetupFormValues {
  return {
    kind: m.kind,
    title: m.title,
    description: m.description,
    startsAt: m.local.startsAt,
    endsAt: m.local.endsAt,
    placeText: m.placeText,
    mapUrl: m.mapUrl ?? '',
    onlineUrl: m.onlineUrl ?? '',
    capacity: String(m.capacity),
    hostId: m.host?.userId ?? '',
    slotMinutes: String(m.slotMinutes ?? CLINIC_SLOT_MINUTES.default),
  };
}

/** The API's input: only what the kind uses (an online meetup has no place, only a clinic has slots). */
export function toInput(v: MeetupFormValues): CreateMeetupInput {
  const online = v.kind === 'online';
  return {
    kind: v.kind,
    title: v.title,
    description: v.description,
    startsAt: v.startsAt,
    endsAt: v.endsAt,
    placeText: online ? '' : v.placeText,
    mapUrl: online ? null : v.mapUrl.trim() || null,
    onlineUrl: online ? v.onlineUrl.trim() || null : null,
    capacity: Number(v.capacity),
    hostId: v.hostId || null,
    slotMinutes: v.kind === 'clinic' ? Number(v.slotMinutes) : CLINIC_SLOT_MINUTES.default,
  };
}

/** Only the fields an edit changed, so the server tells people about what really moved. */
export function patchOf(values: MeetupFormValues, initial: MeetupFormValues): UpdateMeetupInput {
  const next = toInput(values);
  const before = toInput(initial);
  const patch: Record<string, unknown> = {};
  for (const key of Object.keys(next) as (keyof CreateMeetupInput)[]) {
    if (JSON.stringify(next[key]) !== JSON.stringify(before[key])) patch[key] = next[key];
  }
  return patch as UpdateMeetupInput;
}

/** Who may run a meetup: the club's active mentors and admins. */
export function hostsAmong(
  members: readonly { userId: string; displayName: string; role: string; status: string }[],
): { userId: string; displayName: string }[] {
  return members
    .filter((m) => m.status === 'active' && (m.role === 'mentor' || m.role === 'admin'))
    .map((m) => ({ userId: m.userId, displayName: m.displayName }))
    .sort((a, b) => a.displayName.localeCompare(b.displayName));
}
