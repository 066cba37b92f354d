import { Caution, CAUTIONS } from '../../../components/ui/cautions';

/** Cautions that belong to tank actions; the general ones are worded once in the care feature. */
export const TANK_CAUTIONS = {
  waterChange:
    'Match the new water to the tank: same temperature and, for salt water, the same salinity. Treat tap water with a conditioner, and follow the label of any salt mix or conditioner.',
  quarantine:
    'Keep new animals in a separate quarantine tank for a few weeks before they join the others, and ask a vet who knows fish if they look unwell.',
  ...CAUTIONS,
} as const;

export function TankCaution({ kind, title }: { kind: keyof typeof TANK_CAUTIONS; title?: string }) {
  return <Caution title={title}>{TANK_CAUTIONS[kind]}</Caution>;
}
