export const TEMPERATURE_UNITS = ['C', 'F'] as const;
export const VOLUME_UNITS = ['L', 'USgal'] as const;
export const SALINITY_DISPLAYS = ['sg', 'ppt'] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];
export type VolumeUnit = (typeof VOLUME_UNITS)[number];
export type SalinityDisplay = (typeof SALINITY_DISPLAYS)[number];
