import type { Role } from '@shared/constants/roles';

/** The invented demo clubs and people. Every name here is made up; the addresses use the reserved .example domain. */
export const DEMO_PASSWORD = 'tidepool-demo-26';

export const DEMO_CLUBS = [
  {
    slug: 'harbourlight',
    name: 'Harbourlight Marine Keepers',
    description: 'A small club of marine and seahorse keepers who meet on the first Thursday of the month.',
    locationText: 'Harbourlight community hall, room 2 (an invented place)',
    timeZone: 'Europe/London',
  },
  {
    slug: 'saltmarsh',
    name: 'Saltmarsh Seahorse Circle',
    description: 'Keepers of captive-bred seahorses sharing feeding and husbandry notes.',
    locationText: 'Online and at members’ homes (an invented club)',
    timeZone: 'Europe/London',
  },
] as const;

export type DemoClubSlug = (typeof DEMO_CLUBS)[number]['slug'];

export interface DemoPerson {
  email: string;
  displayName: string;
  experienceLevel: 'beginner' | 'some-experience' | 'experienced';
  roles: Partial<Record<DemoClubSlug, Role>>;
  /** Whose mentee this person is, by e-mail, per club. */
  mentoredBy?: Partial<Record<DemoClubSlug, string>>;
  blurb: string;
}

export const DEMO_PEOPLE: DemoPerson[] = [
  {
    email: 'marisol@harbourlight.example',
    displayName: 'Marisol Okonkwo-Hale',
    experienceLevel: 'experienced',
    roles: { harbourlight: 'admin' },
    blurb: 'runs the Harbourlight club',
  },
  {
    email: 'teodor@harbourlight.example',
    displayName: 'Teodor Vanstone',
    experienceLevel: 'experienced',
    roles: { harbourlight: 'mentor' },
    blurb: 'mentors Jonah and Ines',
  },
  {
    email: 'priya@harbourlight.example',
    displayName: 'Priya Lindqvist-Rao',
    experienceLevel: 'experienced',
    roles: { harbourlight: 'mentor', saltmarsh: 'admin' },
    blurb: 'mentor at Harbourlight, admin of Saltmarsh',
  },
  {
    email: 'jonah@harbourlight.example',
    displayName: 'Jonah Abernethy-Cole',
    experienceLevel: 'beginner',
    roles: { harbourlight: 'member' },
    mentoredBy: { harbourlight: 'teodor@harbourlight.example' },
    blurb: 'beginner, first seahorse tank',
  },
  {
    email: 'ines@harbourlight.example',
    displayName: 'Ines Carvalho-Reyes',
    experienceLevel: 'beginner',
    roles: { harbourlight: 'member', saltmarsh: 'member' },
    mentoredBy: { harbourlight: 'teodor@harbourlight.example' },
    blurb: 'beginner, fish-only marine tank',
  },
  {
    email: 'wendell@harbourlight.example',
    displayName: 'Wendell Thorsby',
    experienceLevel: 'some-experience',
    roles: { harbourlight: 'member' },
    blurb: 'member without a mentor yet',
  },
];
