import type { EntityManager } from 'typeorm';
import { User } from './user.entity';

/** The account with this e-mail address, compared without regard to case. */
export async function userByEmail(m: EntityManager, email: string): Promise<User | null> {
  return m.createQueryBuilder(User, 'u').where('lower(u.email) = lower(:e)', { e: email }).getOne();
}

export async function findUser(m: EntityManager, userId: string): Promise<User | null> {
  return m.findOneBy(User, { id: userId });
}
