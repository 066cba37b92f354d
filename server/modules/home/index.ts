/** The home: the viewer's own tanks with today's tests, their questions and their mentor's good news, in one request. */
export { homeRouter } from './home.router';
