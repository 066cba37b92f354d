import { SectionRouteError } from '@client/components/errors/route-error';

const WORDS = {
  forbidden: { title: "That isn't yours to see", detail: 'Questions are read by the keeper who asked, their mentor and the club admins.' },
  notFound: { title: "We couldn't find that question", detail: 'The link may be old, or the question belongs to another of your clubs: switch club and try again.' },
};

/** Route error for the question pages, with a way back to the list. */
export const QuestionRouteError = () => <SectionRouteError words={WORDS} back={{ to: '/questions', label: 'Back to questions' }} />;
