import { SectionError, SectionRouteError } from '@client/components/errors/route-error';

const WORDS = {
  forbidden: {
    title: "That isn't yours to see",
    detail: 'Questions are read by the keeper who asked, their mentor and the club admins.',
  },
  notFound: {
    title: "We couldn't find that question",
    detail:
      'The link may be old, or the question belongs to another of your clubs: switch club and try again.',
  },
};

const BACK = { to: '/questions', label: 'Back to questions' };

/** Route error for the question pages, with a way back to the list. */
export const QuestionRouteError = () => <SectionRouteError words={WORDS} back={BACK} />;

/** The same words when the question could not be loaded. */
export const QuestionLoadError = ({ error }: { error: unknown }) => (
  <SectionError error={error} words={WORDS} back={BACK} />
);
