import type { ReactNode } from 'react';
import { TONES } from './badge';

/** The trade's usual cautions, worded once, shown beside the actions they belong to. */
export const CAUTIONS = {
  fishlessCycling:
    'Cycling with bottled ammonia? Use plain ammonia with no soap, scent or colour. It burns eyes and lungs: wear gloves and eye protection, keep air moving, store it away from children and never mix it with bleach. Follow the safety advice on its label.',
  dosing:
    'Dosing chemicals: follow the label, dissolve away from the animals and never raise a value faster than its daily limit. Keep products labelled and out of reach.',
  electricity:
    'Electricity and water: every tank circuit on an RCD/GFCI, a drip loop on every cable, and unplug heaters and pumps before your hands go in. Wiring work is for a licensed electrician under your local code.',
  medication: 'Medicate fish only on the advice of a veterinarian who knows aquatic animals.',
  buyingAnimals:
    'Buy animals only from legal, documented sources. Seahorses are protected by international trade rules (CITES) and national laws in many places: prefer captive-bred animals and keep the paperwork.',
  waterChange:
    'Match the new water to the tank: same temperature and, for salt water, the same salinity. Treat tap water with a conditioner, and follow the label of any salt mix or conditioner.',
  quarantine:
    'Keep new animals in a separate quarantine tank for a few weeks before they join the others, and ask a vet who knows fish if they look unwell.',
} as const;

export function Caution({ children, title = 'Take care' }: { children: ReactNode; title?: string }) {
  return (
    <aside className={`flex gap-3 rounded-control px-4 py-3 text-sm ring-1 ${TONES.watch}`}>
      <span aria-hidden className="mt-0.5 text-base font-extrabold">
        !
      </span>
      <p>
        <strong className="font-extrabold">{title}: </strong>
        {children}
      </p>
    </aside>
  );
}

/** One of the worded cautions, by name, beside the action it belongs to. */
export function CautionFor({ kind, title }: { kind: keyof typeof CAUTIONS; title?: string }) {
  return <Caution title={title}>{CAUTIONS[kind]}</Caution>;
}
