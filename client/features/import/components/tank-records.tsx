import { Link } from 'react-router';
import { DownloadIcon, UploadIcon } from '@client/components/ui/icons';

const linkButton = 'inline-flex min-h-touch items-center justify-center gap-2 rounded-full bg-white px-5 font-bold text-tide-800 ring-1 ring-tide-200 hover:bg-tide-50';

/** Getting the records out as a spreadsheet, and an old log in. */
export function TankRecords({ clubId, tankId, canImport }: { clubId: string; tankId: string; canImport: boolean }) {
  return (
    <div className="space-y-3">
      <p className="text-tide-700">
        Download every test and entry as a CSV file for a spreadsheet; the headers name the units.
        {canImport ? ' Kept a log before? Bring it in from a CSV file.' : ''}
      </p>
      <div className="flex flex-wrap gap-2">
        <a href={`/api/clubs/${clubId}/tanks/${tankId}/export.csv`} download className={linkButton}><DownloadIcon /> Download CSV</a>
        {canImport ? <Link to={`/tanks/${tankId}/import`} className={linkButton}><UploadIcon /> Import a CSV log</Link> : null}
      </div>
    </div>
  );
}
