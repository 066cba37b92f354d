/** How far back the home shows good news (a sign-off, a concern your mentor resolved). A product choice. */
export const GOOD_NEWS_DAYS = 14;
/** The most questions the home lists; the questions page has the rest. */
export const HOME_QUESTIONS_MAX = 8;
/** How much of the latest reply the home quotes. */
export const HOME_REPLY_EXCERPT_MAX = 160;
/** The desk's tanks a mentor's home shows before "open the desk". */
export const HOME_DESK_TANKS_MAX = 3;
