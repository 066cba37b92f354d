import { Link } from 'react-router';
import { CYCLE_DURATION_WEEKS } from '@shared/care';
import { CautionFor } from '@client/components/ui/cautions';
import { Card } from '@client/components/ui/card';
import { LINK_BUTTON } from './link-button';

const STAGES = [
  {
    title: 'Ammonia appears',
    text: 'Fish waste, left-over food or a dose of ammonia puts ammonia in the water. It is toxic to animals.',
  },
  {
    title: 'Nitrite rises',
    text: 'The first bacteria grow and turn ammonia into nitrite, which is toxic too.',
  },
  {
    title: 'Both fall to zero',
    text: 'A second group of bacteria turns nitrite into nitrate, which is far less harmful and kept low with water changes.',
  },
] as const;

/** A member without a tank: add the first one, then what the weeks of the nitrogen cycle will look like. */
export function FirstTankStart({ canCreate }: { canCreate: boolean }) {
  const w = CYCLE_DURATION_WEEKS;
  return (
    <Card>
      <h2 className="text-lg font-extrabold text-ink">Start with your first tank</h2>
      <ol className="mt-3 space-y-4">
        <li>
          <p className="font-bold text-ink">1. Add your tank</p>
          <p className="text-sm text-ink-soft">
            What kind of water it holds and how big it is. Shoalwise then knows which tests to ask for and how
            often.
          </p>
          {canCreate ? (
            <Link to="/tanks/new" className={`${LINK_BUTTON.primary} mt-2 min-h-14 w-full text-lg sm:w-auto`}>
              Add my first tank
            </Link>
          ) : null}
        </li>
        <li>
          <p className="font-bold text-ink">2. Let it cycle before any animals go in</p>
          <p className="text-sm text-ink-soft">
            A new tank has none of the bacteria that make waste safe. They grow over the first weeks, usually{' '}
            {w.typicalMin}–{w.typicalMax} (sometimes {w.rangeMin}–{w.rangeMax}; a keepers’ rule of thumb). You
            will see it in your tests:
          </p>
          <ol className="mt-2 grid gap-2 sm:grid-cols-3">
            {STAGES.map((s, i) => (
              <li key={s.title} className="rounded-xl bg-tint px-3 py-2 text-sm text-ink-soft">
                <p className="font-bold text-ink">
                  {i + 1}. {s.title}
                </p>
                <p>{s.text}</p>
              </li>
            ))}
          </ol>
          <p className="mt-2 text-sm text-ink-soft">
            Test ammonia and nitrite every day or two; the home tells you which tests are due. Many keepers
            cycle without fish by adding a little ammonia each day, so no animal suffers while the bacteria
            grow.
          </p>
          <div className="mt-2">
            <CautionFor kind="fishlessCycling" title="Ammonia is a hazardous chemical" />
          </div>
        </li>
        <li>
          <p className="font-bold text-ink">3. Animals once your mentor agrees</p>
          <p className="text-sm text-ink-soft">
            When ammonia and nitrite stay at zero, your mentor checks the tank with you and signs it off for
            its first animals.
          </p>
        </li>
      </ol>
    </Card>
  );
}
