/** Care profiles: the shipped ones and a club's own versioned copies; which one a tank follows. */
export { ClubCareProfile, ClubCareProfileVersion } from './care-profile.entity';
export { careProfileRouter } from './care-profile.router';
export { copyProfile, resolveProfile, resolveProfiles, type ProfileSummary } from './care-profile.service';
