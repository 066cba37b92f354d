/** Questions: a keeper asks about a reading, with a snapshot of the figures; mentors and admins answer. */
export { Question, QuestionReply } from './question.entity';
export { unansweredCountsByTank } from './question.queries';
export { questionRouter } from './question.router';
export { askQuestion } from './question.service';
