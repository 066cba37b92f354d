/** The meetups module's public face: its routers, the reminder job, and what a seed or a test may call. */
export { meetupsRouter, type MeetupDeps } from './meetups.router';
export { calendarFeedRouter } from './calendar-feed.router';
export { feedUrl } from './calendar-feed-token';
export { sendDueReminders, startMeetupReminders, type ReminderScheduler } from './meetup-reminders';
export { createMeetup } from './meetups.service';
export { bookSlot, respond } from './rsvp.service';
export { loadMeetup } from './meetups.queries';
export { Meetup, MeetupRsvp } from './meetup.entity';
