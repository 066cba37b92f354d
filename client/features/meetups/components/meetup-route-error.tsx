import { SectionRouteError } from '@client/components/errors/route-error';

const WORDS = {
  forbidden: {
    title: "That isn't yours to do",
    detail: 'Club admins plan meetups; admins and whoever runs a meetup tick people in.',
  },
  notFound: {
    title: "We couldn't find that meetup",
    detail: 'The link may be old, or it belongs to another of your clubs: switch club and try again.',
  },
};

/** Route error for the meetup pages, with a way back to the list. */
export const MeetupRouteError = () => (
  <SectionRouteError words={WORDS} back={{ to: '/meetups', label: 'Back to meetups' }} />
);
