const MINUTE = 60_000;

/** The start of every slot that fits whole between the clinic's start and end, ISO, earliest first. */
export function clinicSlots(startsAt: Date | string, endsAt: Date | string, slotMinutes: number): string[] {
  const start = new Date(startsAt).getTime();
  const end = new Date(endsAt).getTime();
  const step = slotMinutes * MINUTE;
  const slots: string[] = [];
  for (let at = start; at + step <= end; at += step) slots.push(new Date(at).toISOString());
  return slots;
}
