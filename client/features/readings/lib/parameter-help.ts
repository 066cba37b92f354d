import type { ParameterKey } from '@shared/care/parameters';

/**
 * One or two plain sentences beside each field of the water-test form, for someone on their first tests:
 * what the figure is and why it matters. What counts as good for a tank comes from its care profile, not from here.
 */
export const PARAMETER_HELP: Record<ParameterKey, string> = {
  temperature:
    'Read the tank thermometer, not the heater dial. Steady matters more than exact: sudden swings stress animals.',
  salinity:
    'How salty the water is. A refractometer or hydrometer is calibrated at a reference temperature; pick the one printed on yours so the reading is corrected.',
  pH: 'How acid or alkaline the water is. It moves a little between morning and evening, so test at about the same time of day.',
  ammonia:
    'Waste from fish and rotting food. Test kits measure the total; the app works out the free part, which is the toxic one and grows with pH and warmth.',
  nitrite:
    'Made by bacteria from ammonia. It stops blood carrying oxygen, so any nitrite in a tank with animals needs action.',
  nitrate:
    'The last step of the nitrogen cycle: far less toxic, but it builds up between water changes. Seahorses and corals want it low.',
  alkalinity:
    'The water’s buffer that holds pH steady; corals use it up as they grow. Keep it steady rather than chasing a number.',
  calcium:
    'Corals and snails build skeletons and shells from it. Test it together with alkalinity; they fall together.',
  magnesium:
    'Keeps calcium and alkalinity in balance. It changes slowly, so testing every week or two is enough.',
  phosphate:
    'Comes from food. A little feeds coral; too much feeds algae. Hobby kits are least exact at low values.',
};
