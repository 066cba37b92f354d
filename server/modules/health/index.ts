/** Whether the app and its database are up. */
export { healthRouter } from './health.router';
