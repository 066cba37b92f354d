import Papa from 'papaparse';
import { PARAMETER_KEYS, parameterInfo } from '@shared/care/parameters';
import { parameterHeader } from '@shared/readings/csv-columns';
import { valuesOf, type TankEvent, type WaterTest } from '../tanks';

export const EXPORT_HEADERS = [
  'record',
  'date (UTC)',
  ...PARAMETER_KEYS.map(parameterHeader),
  parameterHeader('freeAmmonia'),
  'note',
  'details',
];

/** A little more precision than the screen shows, so a re-import gives back the same readings. */
const number = (key: Parameters<typeof parameterInfo>[0], v: number | null | undefined) =>
  v === null || v === undefined ? '' : Number(v.toFixed(parameterInfo(key).decimals + 2));

function plain(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'object') {
    return Object.entries(value)
      .filter(([, v]) => v !== undefined && v !== null && v !== '')
      .map(([k, v]) => `${k} ${plain(v)}`)
      .join(', ');
  }
  return String(value);
}

/** "water-change: 20 L (25 %), sourceWater ro-di-fresh" — readable in a spreadsheet cell. */
function describeEvent(e: TankEvent): string {
  const amount =
    e.computed.litres !== undefined
      ? `${Number(e.computed.litres.toFixed(1))} L (${Math.round((e.computed.fraction ?? 0) * 100)} %)`
      : '';
  const { volumeL: _v, percent: _p, livestockId: _l, ...rest } = e.details as Record<string, unknown>;
  return [amount, plain(rest)].filter(Boolean).join(', ');
}

/**
 * Readings and events of a tank, oldest first, headers naming their units. Cells that a spreadsheet would run as a
 * formula (starting with = + - @, tab or CR) get a leading quote (ASVS 1.2.10); numbers are written as numbers.
 */
export function exportCsv(tests: readonly WaterTest[], events: readonly TankEvent[]): string {
  const rows = [
    ...tests.map((t) => {
      const values = valuesOf(t);
      return {
        at: t.takenAt.getTime(),
        cells: [
          'water-test',
          t.takenAt.toISOString(),
          ...PARAMETER_KEYS.map((k) => number(k, values[k])),
          number('freeAmmonia', t.freeAmmoniaMgL),
          t.note,
          '',
        ],
      };
    }),
    ...events.map((e) => ({
      at: e.occurredAt.getTime(),
      cells: [
        e.kind,
        e.occurredAt.toISOString(),
        ...PARAMETER_KEYS.map(() => ''),
        '',
        e.note,
        describeEvent(e),
      ],
    })),
  ].sort((a, b) => a.at - b.at);
  return `\uFEFF${Papa.unparse({ fields: EXPORT_HEADERS, data: rows.map((r) => r.cells) }, { escapeFormulae: true, newline: '\r\n' })}\r\n`;
}
