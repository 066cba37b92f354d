import type { User } from './user.entity';

export function presentUser(u: User) {
  return {
    id: u.id,
    email: u.email,
    displayName: u.displayName,
    experienceLevel: u.experienceLevel,
    temperatureUnit: u.temperatureUnit,
    volumeUnit: u.volumeUnit,
    salinityDisplay: u.salinityDisplay,
    timeZone: u.timeZone,
  };
}
export type UserView = ReturnType<typeof presentUser>;
