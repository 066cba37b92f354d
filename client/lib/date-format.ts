/** The app's dates, in the reader's language and time zone. */
const day = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short' });
const date = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
const dayTime = new Intl.DateTimeFormat(undefined, {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});

const toMs = (at: number | string | Date) => (typeof at === 'string' ? Date.parse(at) : at);

/** "12 Mar". */
export const formatDay = (at: number | string | Date) => day.format(toMs(at));
/** "12 Mar 2026". */
export const formatDate = (at: number | string | Date) => date.format(toMs(at));
/** "12 Mar 2026, 08:15". */
export const formatDayTime = (at: number | string | Date) => dayTime.format(toMs(at));
