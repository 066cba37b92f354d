import { useState } from 'react';
import { guessTarget } from '@shared/readings/csv-columns';
import { CSV_DELIMITERS, CSV_MAX_BYTES } from '@shared/schemas/csv-import.schema';
import type { ImportCommitResult, ImportPreview } from '@shared/schemas/tank-views';
import { Button, ButtonLink } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { ApiError } from '@client/lib/api-client';
import { previewImport, useCommitImport } from '../api/csv-import';
import { glanceAt, type CsvGlance } from '../lib/csv-chunks';
import type { UnitPrefs } from '@client/lib/display-units';
import { requestFor, type Delimiter, type ImportSettings } from './import-settings';
import { MappingStep } from './mapping-step';
import { ProgressBar } from './progress-bar';
import { ReviewStep } from './review-step';

type Step =
  | { name: 'file'; problem?: string }
  | { name: 'mapping'; problem?: string }
  | { name: 'review'; preview: ImportPreview }
  /** fraction: the upload's share sent; null once it is all sent and the server is saving. */
  | { name: 'saving'; preview: ImportPreview; fraction: number | null; problem?: string }
  | { name: 'done'; preview: ImportPreview; result: ImportCommitResult };

interface LoadedFile {
  name: string;
  text: string;
  glance: CsvGlance;
}

const isDelimiter = (d: string): d is Delimiter => (CSV_DELIMITERS as readonly string[]).includes(d);
const messageOf = (e: unknown) =>
  e instanceof ApiError ? e.message : 'Could not reach Shoalwise. Check your connection and try again.';
/** A problem with the file itself (encoding, size, empty) sends the member back to choose another one. */
const isFileProblem = (e: unknown) =>
  e instanceof ApiError && (e.status === 413 || e.issues.some((i) => i.path === 'csv'));

/** Imports an old log: choose a file, say what each column holds, see every bad row, then save with progress. */
export function ImportFlow({
  clubId,
  tankId,
  prefs,
  timeZone,
}: {
  clubId: string;
  tankId: string;
  prefs: UnitPrefs;
  timeZone: string;
}) {
  const [step, setStep] = useState<Step>({ name: 'file' });
  const [file, setFile] = useState<LoadedFile>();
  const [columns, setColumns] = useState<string[]>([]);
  const [settings, setSettings] = useState<ImportSettings>({ mapping: {}, units: {} });
  const [checked, setChecked] = useState<{ settings: ImportSettings; preview: ImportPreview }>();
  const [sending, setSending] = useState<number | null | undefined>(undefined);
  const commit = useCommitImport(clubId, tankId);

  const runPreview = async (text: string, s: ImportSettings): Promise<ImportPreview> => {
    setSending(0);
    try {
      return await previewImport(clubId, tankId, requestFor(text, s), (f) => setSending(f < 1 ? f : null));
    } finally {
      setSending(undefined);
    }
  };

  const choose = async (picked: File) => {
    if (picked.size > CSV_MAX_BYTES)
      return setStep({
        name: 'file',
        problem: `The file is larger than ${CSV_MAX_BYTES / 1024 / 1024} MB. Split it into smaller files.`,
      });
    const text = await picked.text();
    const glance = glanceAt(text);
    setFile({ name: picked.name, text, glance });
    setColumns(glance.header);
    const guessed: ImportSettings = {
      mapping: Object.fromEntries(glance.header.map((h) => [h, guessTarget(h)])),
      units: {},
    };
    try {
      const preview = await runPreview(text, { mapping: {}, units: {} });
      const found: ImportSettings = {
        mapping: preview.mapping,
        units: preview.units,
        dateFormat: preview.dateFormat,
        ...(isDelimiter(preview.delimiter) ? { delimiter: preview.delimiter } : {}),
      };
      setColumns(preview.columns);
      setSettings(found);
      setChecked({ settings: found, preview });
      setStep({ name: 'mapping' });
    } catch (e) {
      if (isFileProblem(e)) return setStep({ name: 'file', problem: messageOf(e) });
      setSettings(guessed);
      setStep({ name: 'mapping', problem: messageOf(e) });
    }
  };

  const check = async () => {
    if (!file) return;
    if (checked && JSON.stringify(checked.settings) === JSON.stringify(settings))
      return setStep({ name: 'review', preview: checked.preview });
    try {
      const preview = await runPreview(file.text, settings);
      setColumns(preview.columns);
      setChecked({ settings, preview });
      setStep({ name: 'review', preview });
    } catch (e) {
      setStep({ name: 'mapping', problem: messageOf(e) });
    }
  };

  const save = async (preview: ImportPreview) => {
    if (!file) return;
    // The save says exactly what the checked preview resolved, so it cannot guess differently from the review.
    const resolved: ImportSettings = {
      ...settings,
      mapping: preview.mapping,
      units: preview.units,
      dateFormat: preview.dateFormat,
      ...(isDelimiter(preview.delimiter) ? { delimiter: preview.delimiter } : {}),
    };
    setStep({ name: 'saving', preview, fraction: 0 });
    try {
      // One request, one transaction: every valid row is saved, or none is.
      const result = await commit(requestFor(file.text, resolved), (f) =>
        setStep({ name: 'saving', preview, fraction: f < 1 ? f : null }),
      );
      setStep({ name: 'done', preview, result });
    } catch (e) {
      setStep({ name: 'saving', preview, fraction: 0, problem: messageOf(e) });
    }
  };

  const restart = () => {
    setFile(undefined);
    setChecked(undefined);
    setStep({ name: 'file' });
  };

  if (sending !== undefined) {
    return (
      <ProgressBar
        label={sending === null ? `Checking every row of ${file?.name ?? 'the file'}…` : 'Sending the file…'}
        fraction={sending}
      />
    );
  }
  switch (step.name) {
    case 'file':
      return (
        <div className="space-y-4">
          {step.problem ? <Notice tone="error">{step.problem}</Notice> : null}
          <p className="text-ink-muted">
            A CSV file from a spreadsheet: one row per test, a column with the date, and a column per reading.
            Nothing is saved until you have seen every row that has a problem.
          </p>
          <label className="inline-flex min-h-14 cursor-pointer items-center gap-2 rounded-full bg-accent px-6 text-lg font-bold text-on-accent">
            Choose a CSV file
            <input
              type="file"
              accept=".csv,text/csv,text/plain"
              className="sr-only"
              onChange={(e) => {
                const f = e.target.files?.[0];
                e.target.value = '';
                if (f) void choose(f);
              }}
            />
          </label>
        </div>
      );
    case 'mapping':
      return (
        <div className="space-y-3">
          <p className="text-sm font-bold text-ink-muted">
            {file?.name}
            {checked ? ` · ${checked.preview.rows.toLocaleString()} rows` : ''}
          </p>
          <MappingStep
            columns={columns}
            glance={file!.glance}
            settings={settings}
            problem={step.problem}
            busy={false}
            timeZone={timeZone}
            onChange={setSettings}
            onCheck={() => void check()}
            onBack={restart}
          />
        </div>
      );
    case 'review':
      return (
        <ReviewStep
          preview={step.preview}
          prefs={prefs}
          onConfirm={() => void save(step.preview)}
          onBack={() => setStep({ name: 'mapping' })}
        />
      );
    case 'saving':
      return (
        <div className="space-y-4">
          <ProgressBar
            label={
              step.fraction === null
                ? `Saving ${step.preview.valid.toLocaleString()} tests in one go…`
                : `Sending ${step.preview.valid.toLocaleString()} tests…`
            }
            fraction={step.fraction}
          />
          {step.problem ? (
            <>
              <Notice tone="error">
                {step.problem} Nothing was saved: the file is saved all together or not at all, so it is safe
                to try again.
              </Notice>
              <Button onClick={() => void save(step.preview)}>Try again</Button>
            </>
          ) : null}
        </div>
      );
    case 'done':
      return (
        <div className="space-y-4">
          <Notice tone="success">
            Saved {step.result.imported.toLocaleString()} {step.result.imported === 1 ? 'test' : 'tests'} from{' '}
            {file?.name}.
            {step.preview.invalid
              ? ` ${step.preview.invalid.toLocaleString()} rows with errors were left out.`
              : ''}
            {step.result.duplicates || step.preview.duplicates
              ? ` ${Math.max(step.result.duplicates, step.preview.duplicates).toLocaleString()} were already on the tank.`
              : ''}
          </Notice>
          <div className="flex flex-wrap gap-2">
            <ButtonLink to={`/tanks/${tankId}`}>See them on the charts</ButtonLink>
            <Button variant="secondary" onClick={restart}>
              Import another file
            </Button>
          </div>
        </div>
      );
  }
}
