/** Every kind of tank the product knows. Single source of truth for the list. */
export const SYSTEM_TYPES = [
  'marine-fish-only',
  'reef',
  'seahorse',
  'brackish',
  'tropical-freshwater',
  'coldwater',
] as const;

export type SystemType = (typeof SYSTEM_TYPES)[number];

const SALT_SYSTEMS: ReadonlySet<SystemType> = new Set(['marine-fish-only', 'reef', 'seahorse', 'brackish']);

/** True where the water has salt in it, so salinity must be measured, not assumed zero. */
export function isSaltwaterSystem(systemType: SystemType): boolean {
  return SALT_SYSTEMS.has(systemType);
}

export function isSystemType(value: string): value is SystemType {
  return (SYSTEM_TYPES as readonly string[]).includes(value);
}
