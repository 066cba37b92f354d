import { SectionError, SectionRouteError } from '@client/components/errors/route-error';

const WORDS = {
  forbidden: {
    title: "That isn't yours to see",
    detail:
      'This tank belongs to another member. Their mentor and the club admins can follow it; ask them if you think you should too.',
  },
  notFound: {
    title: "That isn't yours to see",
    detail:
      'There is no such tank in your club: the link may be old, the tank may belong to another club, or it may be kept private to its owner.',
  },
};

const BACK = { to: '/tanks', label: 'Back to my tanks' };

/** Route error for the tank pages (and the pages of what is logged on a tank), with a way back to the list. */
export const TankRouteError = () => <SectionRouteError words={WORDS} back={BACK} />;

/** The same words when the tank (or a record on it) could not be loaded: the reader may not see it, or it is gone. */
export const TankLoadError = ({ error }: { error: unknown }) => (
  <SectionError error={error} words={WORDS} back={BACK} />
);
