import type { SystemType } from '../care/system-types';
import type { TankPhase } from '../care/types';
import type { TankShape } from '../chemistry/tank-volume';
import type { CanonicalValues, DerivedInfo } from '../readings/normalize-water-test';
import type { ReadingIssue } from '../readings/issues';
import type { LastKnown } from '../care/evaluation/free-ammonia';
import type { DateFormat, ImportTarget, ImportUnits } from './csv-import.schema';
import type { TankEventDetails, TankEventKind } from './tank-event.schema';
import type { WaterTestEntries } from './water-test.schema';

/** What the API answers with. Times are ISO strings, dates YYYY-MM-DD, numbers in canonical units. */
export interface TankView {
  id: string;
  clubId: string;
  owner: { id: string; displayName: string };
  name: string;
  systemType: SystemType;
  volumeL: number;
  volume:
    | { source: 'entered' }
    | {
        source: 'dimensions';
        shape: TankShape;
        dimensionsCm: {
          length?: number;
          width?: number;
          height: number;
          diameter?: number;
          bowDepth?: number;
        };
        fillHeightCm: number | null;
        displacementFraction: number;
        grossL: number;
      };
  setUpOn: string | null;
  phase: TankPhase;
  equipmentNotes: string;
  careProfileKey: string;
  hasLivestock: boolean;
  archivedAt: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface TankDetailView extends TankView {
  livestock: LivestockView[];
  /** The latest temperature, pH and salinity on record: what a new test's free ammonia falls back on. */
  lastKnown: LastKnown;
}

export interface LivestockView {
  id: string;
  tankId: string;
  speciesCommonName: string;
  count: number;
  addedOn: string;
  source: string;
  quarantineNotes: string;
  removedOn: string | null;
  removalReason: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface PhotoView {
  id: string;
  tankId: string;
  waterTestId: string | null;
  eventId: string | null;
  caption: string;
  width: number;
  height: number;
  /** API paths (under /api) that serve the picture and its thumbnail. */
  url: string;
  thumbUrl: string;
  createdAt: string;
}

export interface WaterTestView {
  id: string;
  tankId: string;
  takenAt: string;
  values: CanonicalValues;
  /** mg/L NH3; null when there is no ammonia reading or it could not be worked out (see derived). */
  freeAmmonia: number | null;
  entries: WaterTestEntries;
  derived: DerivedInfo;
  note: string;
  origin: 'form' | 'import';
  createdById: string | null;
  createdAt: string;
  updatedAt: string;
  photos: PhotoView[];
}

export interface TankEventView<K extends TankEventKind = TankEventKind> {
  id: string;
  tankId: string;
  kind: K;
  occurredAt: string;
  note: string;
  details: TankEventDetails<K>;
  /** Worked out by the server: for water changes, litres and the share of the tank. */
  computed: { litres?: number; fraction?: number; sourceNitrateMgL?: number; sourceSalinity?: number };
  livestockId: string | null;
  createdById: string | null;
  createdAt: string;
  updatedAt: string;
  photos: PhotoView[];
}

export type TimelineItem =
  | { type: 'water-test'; at: string; waterTest: WaterTestView }
  | { type: 'event'; at: string; event: TankEventView };

export interface Page<T> {
  items: T[];
  /** Pass as `before` for the next (older) page; null on the last page. */
  nextCursor: string | null;
}

/** One test, with what its free ammonia falls back on: the last known values before it (the same shape as the tank's). */
export interface WaterTestDetailView {
  waterTest: WaterTestView;
  lastKnown: LastKnown;
}

export interface WaterTestSaved {
  waterTest: WaterTestView;
  warnings: ReadingIssue[];
}

export interface ImportRowIssue {
  /** Row number as a spreadsheet shows it (the header is row 1). */
  row: number;
  /** The column header, or the field when no column applies. */
  field: string;
  message: string;
}

export interface ImportPreview {
  columns: string[];
  delimiter: string;
  mapping: Record<string, ImportTarget>;
  units: ImportUnits;
  dateFormat: DateFormat;
  timeZone: string;
  rows: number;
  /** Rows a commit saves. */
  valid: number;
  /** Rows with at least one error. */
  invalid: number;
  /** Rows at the same time as a test already on the tank: left out on commit. */
  duplicates: number;
  /** Rows of other records (events in an exported file): left out. */
  skipped: number;
  errors: ImportRowIssue[];
  errorCount: number;
  warnings: ImportRowIssue[];
  warningCount: number;
  sample: { row: number; takenAt: string; values: CanonicalValues }[];
}

export interface ImportCommitResult {
  imported: number;
  invalid: number;
  duplicates: number;
  skipped: number;
  firstTakenAt: string | null;
  lastTakenAt: string | null;
}
