import { clinicSlots } from '../../../shared/meetups/clinic-slots';
import { describeClubTime, utcToClubTime } from '../../../shared/meetups/club-time';
import type {
  AttendanceHistoryView,
  ClinicSlotView,
  MeetupDetailView,
  MeetupSummaryView,
} from '../../../shared/schemas/meetup-views';
import type { Meetup } from './meetup.entity';
import type { HistoryRow, MeetupRow } from './meetups.queries';

const iso = (d: Date | string) => new Date(d).toISOString();
const timeLabel = (at: string, timeZone: string) => utcToClubTime(at, timeZone).slice(11);

export function presentSummary(r: MeetupRow): MeetupSummaryView {
  return {
    id: r.id,
    clubId: r.clubId,
    kind: r.kind,
    title: r.title,
    status: r.status,
    startsAt: iso(r.startsAt),
    endsAt: iso(r.endsAt),
    local: { startsAt: utcToClubTime(r.startsAt, r.timeZone), endsAt: utcToClubTime(r.endsAt, r.timeZone) },
    timeZone: r.timeZone,
    when: describeClubTime(r.startsAt, r.endsAt, r.timeZone),
    placeText: r.placeText,
    mapUrl: r.mapUrl,
    onlineUrl: r.onlineUrl,
    capacity: r.capacity,
    goingCount: Number(r.goingCount),
    waitlistCount: Number(r.waitlistCount),
    host: r.hostId && r.hostName ? { userId: r.hostId, displayName: r.hostName } : null,
    mine: r.myStatus
      ? {
          status: r.myStatus,
          waitlistPosition: r.myPosition === null ? null : Number(r.myPosition),
          slotStartsAt: r.mySlot ? iso(r.mySlot) : null,
          tank: r.myTankId && r.myTankName ? { id: r.myTankId, name: r.myTankName } : null,
          checkedIn: r.myCheckedInAt !== null,
        }
      : null,
  };
}

export function presentDetail(
  r: MeetupRow,
  m: Meetup,
  booked: { startsAt: Date; userId: string }[],
  viewerId: string,
): MeetupDetailView {
  const taken = new Map(booked.map((b) => [iso(b.startsAt), b.userId]));
  const slots: ClinicSlotView[] =
    m.kind === 'clinic' && m.slotMinutes
      ? clinicSlots(m.startsAt, m.endsAt, m.slotMinutes).map((at) => ({
          startsAt: at,
          label: timeLabel(at, r.timeZone),
          taken: taken.has(at),
          mine: taken.get(at) === viewerId,
        }))
      : [];
  return {
    ...presentSummary(r),
    description: m.description,
    slotMinutes: m.slotMinutes,
    cancelReason: m.cancelReason,
    cancelledAt: m.cancelledAt ? iso(m.cancelledAt) : null,
    slots,
  };
}

export function presentHistory(
  member: { userId: string; displayName: string },
  rows: HistoryRow[],
  now = new Date(),
): AttendanceHistoryView {
  const past = rows.filter((r) => r.status === 'scheduled' && new Date(r.endsAt).getTime() < now.getTime());
  return {
    member,
    attended: past.filter((r) => r.checkedInAt !== null).length,
    missed: past.filter((r) => r.rsvp === 'going' && r.checkedInAt === null).length,
    rows: rows.map((r) => ({
      meetup: {
        id: r.meetupId,
        title: r.title,
        kind: r.kind,
        status: r.status,
        startsAt: iso(r.startsAt),
        when: describeClubTime(r.startsAt, r.endsAt, r.timeZone),
      },
      rsvp: r.rsvp,
      checkedIn: r.checkedInAt !== null,
    })),
  };
}
