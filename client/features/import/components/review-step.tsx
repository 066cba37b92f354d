import { PARAMETER_KEYS } from '@shared/care/parameters';
import type { ImportPreview, ImportRowIssue } from '@shared/schemas/tank-views';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { formatDayTime } from '@client/lib/date-format';
import { formatLabelled, type UnitPrefs } from '@client/lib/display-units';

function IssueTable({ issues, caption }: { issues: ImportRowIssue[]; caption: string }) {
  return (
    <div className="relative max-h-80 overflow-auto rounded-xl ring-1 ring-line">
      <table className="min-w-full text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="sticky top-0 bg-tint text-left text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2">
              Row
            </th>
            <th scope="col" className="px-3 py-2">
              Column
            </th>
            <th scope="col" className="px-3 py-2">
              What is wrong
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-line bg-surface">
          {issues.map((i, n) => (
            <tr key={`${i.row}-${i.field}-${n}`}>
              <td className="px-3 py-2 font-bold tabular-nums">{i.row}</td>
              <td className="px-3 py-2">{i.field}</td>
              <td className="px-3 py-2">{i.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

const plural = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString()} ${n === 1 ? one : many}`;

/** Every row checked, nothing saved yet: what would be saved, and each row that would not and why. */
export function ReviewStep({
  preview,
  prefs,
  onConfirm,
  onBack,
}: {
  preview: ImportPreview;
  prefs: UnitPrefs;
  onConfirm: () => void;
  onBack: () => void;
}) {
  return (
    <div className="space-y-5">
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        {[
          ['Ready to save', preview.valid, 'text-ok'],
          ['With errors', preview.invalid, preview.invalid ? 'text-danger' : 'text-ink'],
          ['Already on the tank', preview.duplicates, 'text-ink'],
          ['Other rows, left out', preview.skipped, 'text-ink'],
        ].map(([label, n, tone]) => (
          <div key={label as string} className="rounded-xl bg-tint px-4 py-3">
            <dt className="text-sm font-bold text-ink-muted">{label}</dt>
            <dd className={`text-2xl font-extrabold tabular-nums ${tone}`}>
              {(n as number).toLocaleString()}
            </dd>
          </div>
        ))}
      </dl>
      {preview.errorCount ? (
        <section className="space-y-2">
          <h3 className="font-extrabold text-danger">{plural(preview.invalid, 'row')} will not be saved</h3>
          <p className="text-sm text-ink-muted">
            Fix them in your spreadsheet and import the file again later, or save the good rows now: the rows
            with errors are simply left out.
          </p>
          <IssueTable issues={preview.errors} caption="Rows with errors" />
          {preview.errorCount > preview.errors.length ? (
            <p className="text-sm text-ink-muted">
              …and {plural(preview.errorCount - preview.errors.length, 'more problem')}.
            </p>
          ) : null}
        </section>
      ) : (
        <Notice tone="success">Every row can be read.</Notice>
      )}
      {preview.warningCount ? (
        <details>
          <summary className="flex min-h-touch cursor-pointer items-center font-bold text-watch">
            {plural(preview.warningCount, 'unusual value')}: saved, but worth a look
          </summary>
          <IssueTable issues={preview.warnings} caption="Unusual values" />
        </details>
      ) : null}
      {preview.sample.length ? (
        <section>
          <h3 className="font-extrabold text-ink">The first rows, as they will be saved</h3>
          <ul className="mt-2 space-y-1 text-sm">
            {preview.sample.map((s) => (
              <li key={s.row} className="rounded-lg bg-surface px-3 py-2 ring-1 ring-line">
                <strong>{formatDayTime(s.takenAt)}</strong>:{' '}
                {PARAMETER_KEYS.filter((k) => s.values[k] !== undefined)
                  .map((k) => formatLabelled(k, s.values[k]!, prefs))
                  .join(' · ')}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button disabled={preview.valid === 0} onClick={onConfirm}>
          {preview.valid ? `Save ${plural(preview.valid, 'test')}` : 'Nothing to save'}
        </Button>
        <Button variant="ghost" onClick={onBack}>
          Change the columns
        </Button>
      </div>
    </div>
  );
}
