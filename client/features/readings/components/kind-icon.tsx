import type { JSX } from 'react';
import type { TankEventKind } from '@shared/schemas/tank-event.schema';
import {
  BottleIcon,
  DropIcon,
  EyeIcon,
  FishIcon,
  FoodIcon,
  TestTubeIcon,
  WrenchIcon,
} from '@client/components/ui/icons';

const ICONS: Record<TankEventKind | 'water-test', () => JSX.Element> = {
  'water-test': TestTubeIcon,
  'water-change': DropIcon,
  'supplement-dose': BottleIcon,
  'feeding-note': FoodIcon,
  'equipment-change': WrenchIcon,
  'livestock-added': FishIcon,
  'livestock-removed': FishIcon,
  observation: EyeIcon,
};

/** The icon of a timeline entry's kind. */
export function KindIcon({ kind }: { kind: TankEventKind | 'water-test' }) {
  const I = ICONS[kind];
  return <I />;
}
