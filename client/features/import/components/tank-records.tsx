import { DownloadIcon, UploadIcon } from '@client/components/ui/icons';
import { ButtonLink, buttonClass } from '@client/components/ui/button';

/** Getting the records out as a spreadsheet, and an old log in. */
export function TankRecords({
  clubId,
  tankId,
  canImport,
}: {
  clubId: string;
  tankId: string;
  canImport: boolean;
}) {
  return (
    <div className="space-y-3">
      <p className="text-ink-muted">
        Download every test and entry as a CSV file for a spreadsheet; the headers name the units.
        {canImport ? ' Kept a log before? Bring it in from a CSV file.' : ''}
      </p>
      <div className="flex flex-wrap gap-2">
        <a
          href={`/api/clubs/${clubId}/tanks/${tankId}/export.csv`}
          download
          className={buttonClass('secondary')}
        >
          <DownloadIcon /> Download CSV
        </a>
        {canImport ? (
          <ButtonLink variant="secondary" to={`/tanks/${tankId}/import`}>
            <UploadIcon /> Import a CSV log
          </ButtonLink>
        ) : null}
      </div>
    </div>
  );
}
