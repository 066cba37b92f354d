import type { DateFormat } from '../schemas/csv-import.schema';

const ISO =
  /^(\d{4})[-/](\d{1,2})[-/](\d{1,2})(?:[T ]+(\d{1,2}):(\d{2})(?::(\d{2})(?:\.(\d{1,6}))?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?)?$/i;
const DAY_MONTH =
  /^(\d{1,2})[/.-](\d{1,2})[/.-](\d{4})(?:[ T,]+(\d{1,2}):(\d{2})(?::(\d{2}))?\s*([ap]\.?m\.?)?)?$/i;
const TIME = /^(\d{1,2}):(\d{2})(?::(\d{2}))?\s*([ap]\.?m\.?)?$/i;

interface Parts {
  y: number;
  m: number;
  d: number;
  hh: number;
  mm: number;
  ss: number;
  ms: number;
  /** Minutes east of UTC when the cell says so; undefined means local time in the import's time zone. */
  offset?: number;
  hasTime: boolean;
}

/** Which written form the dates take; `ambiguous` when every date could be day-first or month-first, `mixed` when both occur. */
export function detectDateFormat(cells: readonly string[]): DateFormat | 'ambiguous' | 'mixed' | 'unknown' {
  const filled = cells.map((c) => c.trim()).filter(Boolean);
  if (filled.length === 0) return 'unknown';
  if (filled.every((c) => ISO.test(c))) return 'iso';
  let dayFirst = false;
  let monthFirst = false;
  let any = false;
  for (const c of filled) {
    const m = DAY_MONTH.exec(c);
    if (!m) continue;
    any = true;
    if (Number(m[1]) > 12) dayFirst = true;
    if (Number(m[2]) > 12) monthFirst = true;
  }
  if (!any) return filled.some((c) => ISO.test(c)) ? 'iso' : 'unknown';
  if (dayFirst && monthFirst) return 'mixed';
  if (!dayFirst && !monthFirst) return 'ambiguous';
  return dayFirst ? 'dmy' : 'mdy';
}

function hour12(h: number, suffix: string | undefined): number | null {
  if (!suffix) return h;
  if (h < 1 || h > 12) return null;
  const pm = suffix.toLowerCase().startsWith('p');
  return (h % 12) + (pm ? 12 : 0);
}

function parseOffset(text: string | undefined): number | undefined {
  if (!text) return undefined;
  if (text.toUpperCase() === 'Z') return 0;
  const m = /^([+-])(\d{2}):?(\d{2})?$/.exec(text);
  if (!m) return undefined;
  return (m[1] === '-' ? -1 : 1) * (Number(m[2]) * 60 + Number(m[3] ?? 0));
}

function parseParts(cell: string, format: DateFormat): Parts | null {
  if (format === 'iso') {
    const m = ISO.exec(cell);
    if (!m) return null;
    return {
      y: Number(m[1]),
      m: Number(m[2]),
      d: Number(m[3]),
      hh: Number(m[4] ?? 12),
      mm: Number(m[5] ?? 0),
      ss: Number(m[6] ?? 0),
      ms: Number((m[7] ?? '0').padEnd(3, '0').slice(0, 3)),
      offset: parseOffset(m[8]),
      hasTime: m[4] !== undefined,
    };
  }
  const m = DAY_MONTH.exec(cell);
  if (!m) return null;
  const hh = hour12(Number(m[4] ?? 12), m[4] === undefined ? undefined : m[7]);
  if (hh === null) return null;
  const [d, mo] = format === 'dmy' ? [Number(m[1]), Number(m[2])] : [Number(m[2]), Number(m[1])];
  return {
    y: Number(m[3]),
    m: mo,
    d,
    hh,
    mm: Number(m[5] ?? 0),
    ss: Number(m[6] ?? 0),
    ms: 0,
    hasTime: m[4] !== undefined,
  };
}

const formatters = new Map<string, Intl.DateTimeFormat>();
function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      second: '2-digit',
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/** How far ahead of UTC the zone's clocks are at that instant, ms. */
function zoneOffsetMs(utcMs: number, timeZone: string): number {
  const whole = Math.floor(utcMs / 1000) * 1000;
  const get = (parts: Intl.DateTimeFormatPart[], type: string) =>
    Number(parts.find((p) => p.type === type)?.value);
  const parts = formatterFor(timeZone).formatToParts(new Date(whole));
  const wall = Date.UTC(
    get(parts, 'year'),
    get(parts, 'month') - 1,
    get(parts, 'day'),
    get(parts, 'hour'),
    get(parts, 'minute'),
    get(parts, 'second'),
  );
  return wall - whole;
}

/** The UTC instant at which clocks in `timeZone` show that wall time (the later one across a DST change). */
export function wallTimeToUtc(wallMs: number, timeZone: string): number {
  let utc = wallMs - zoneOffsetMs(wallMs, timeZone);
  const again = zoneOffsetMs(utc, timeZone);
  if (wallMs - again !== utc) utc = wallMs - again;
  return utc;
}

const daysIn = (y: number, m: number) => new Date(Date.UTC(y, m, 0)).getUTCDate();

/**
 * One date cell (and an optional separate time cell) → ISO instant. Times without an offset are wall-clock time in
 * `timeZone`; a date with no time at all counts as midday, so it stays on its own day in every time zone.
 */
export function parseDateCell(
  cell: string,
  timeCell: string | undefined,
  format: DateFormat,
  timeZone: string,
): { iso: string } | { error: string } {
  const parts = parseParts(cell.trim(), format);
  const example = { iso: '2025-03-04 18:30', dmy: '04/03/2025 18:30', mdy: '03/04/2025 18:30' }[format];
  if (!parts) return { error: `"${cell}" is not a date in the form ${example}.` };
  const time = timeCell?.trim();
  if (time) {
    if (parts.hasTime) return { error: 'The date already has a time; leave the time column empty.' };
    const t = TIME.exec(time);
    const hh = t ? hour12(Number(t[1]), t[4]) : null;
    if (!t || hh === null) return { error: `"${time}" is not a time such as 18:30.` };
    Object.assign(parts, { hh, mm: Number(t[2]), ss: Number(t[3] ?? 0) });
  }
  if (parts.m < 1 || parts.m > 12 || parts.d < 1 || parts.d > daysIn(parts.y, parts.m))
    return { error: `"${cell}" is not a real date.` };
  if (parts.hh > 23 || parts.mm > 59 || parts.ss > 59) return { error: `"${cell}" has an impossible time.` };
  const wall = Date.UTC(parts.y, parts.m - 1, parts.d, parts.hh, parts.mm, parts.ss, parts.ms);
  const utc = parts.offset !== undefined ? wall - parts.offset * 60_000 : wallTimeToUtc(wall, timeZone);
  return { iso: new Date(utc).toISOString() };
}
