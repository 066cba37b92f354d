/** People with an account. */
export { User } from './user.entity';
export { presentUser } from './user.presenter';
export { findUser, userByEmail } from './user.queries';
