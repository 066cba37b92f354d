import { Button } from './button';
import { Notice } from './card';

/** After the record is saved but its photo is not: say so, and offer the upload again or to go on without it. */
export function PhotoRetry({
  saved,
  error,
  busy,
  onSkip,
}: {
  saved: string;
  error: string;
  busy: boolean;
  onSkip: () => void;
}) {
  return (
    <div className="space-y-3">
      <Notice tone="warning">
        {saved} The photo did not upload: {error}
      </Notice>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={busy}>
          Try the photo again
        </Button>
        <Button type="button" variant="secondary" onClick={onSkip}>
          Carry on without it
        </Button>
      </div>
    </div>
  );
}
