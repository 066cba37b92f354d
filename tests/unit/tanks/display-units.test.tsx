import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { afterEach, describe, expect, it } from 'vitest';
import { TROPICAL_FRESHWATER_PROFILE } from '@shared/care/profiles';
import { convert } from '@shared/chemistry/units';
import { salinityAsSpecificGravity } from '@shared/readings/salinity';
import { TankForm } from '@client/features/tanks/components/tank-form/tank-form';
import { profileKeys } from '@client/lib/care-profiles';
import { bandText } from '@client/lib/bands';
import { formatDisplay, formatVolume, toDisplay, type UnitPrefs } from '@client/lib/display-units';
import { newTankDraft } from '@client/features/tanks/lib/tank-draft';

const US: UnitPrefs = { temperatureUnit: 'F', volumeUnit: 'USgal', salinityDisplay: 'sg' };
const METRIC: UnitPrefs = { temperatureUnit: 'C', volumeUnit: 'L', salinityDisplay: 'ppt' };

describe('display units', () => {
  afterEach(cleanup);

  it('when a keeper reads °F and US gallons, then canonical °C and litres are shown converted', () => {
    expect(formatDisplay('temperature', 25, US)).toBe('77 °F');
    expect(formatDisplay('temperature', 25.5, US)).toBe('77.9 °F');
    expect(formatDisplay('temperature', 25.5, METRIC)).toBe('25.5 °C');
    expect(formatVolume(200, US)).toBe('52.8 US gal');
    expect(formatVolume(757.08, US)).toBe('200 US gal');
    expect(formatVolume(200, METRIC)).toBe('200 L');
    expect(toDisplay('temperature', 0, US)).toBe(32);
  });

  it('when salinity is shown as SG or ppt, then PSU becomes the SG a 25 °C instrument reads, or stays as ppt', () => {
    expect(formatDisplay('salinity', 35, US)).toBe(`SG ${salinityAsSpecificGravity(35).toFixed(4)}`);
    expect(formatDisplay('salinity', 35, US)).toMatch(/^SG 1\.02[56]\d$/);
    expect(formatDisplay('salinity', 35, METRIC)).toBe('35 ppt');
  });

  it('when a profile band is shown to a °F keeper, then both ends are converted', () => {
    const band = TROPICAL_FRESHWATER_PROFILE.ranges.temperature!.ideal;
    const [lo, hi] = band.map((c) => String(Number(convert(c, '°C', '°F').toFixed(1))));
    expect(bandText('temperature', band, US)).toBe(`${lo}–${hi} °F`);
    expect(bandText('ammonia', [0, 0], US)).toBe('0 mg/L NH3');
  });

  it('when a US keeper works the volume out from inches, then the live preview shows gross and net US gallons with litres beside', async () => {
    const qc = new QueryClient();
    qc.setQueryData(profileKeys.all('club-1'), {
      profiles: [
        {
          key: 'tropical-freshwater',
          name: 'Tropical freshwater',
          version: 1,
          systemTypes: ['tropical-freshwater'],
          animals: 'fish',
          source: 'built-in',
        },
      ],
    });
    render(
      <QueryClientProvider client={qc}>
        <TankForm
          clubId="club-1"
          prefs={US}
          initial={newTankDraft(US, 'tropical-freshwater', 'tropical-freshwater')}
          submitLabel="Add"
          onSaved={() => {}}
        />
      </QueryClientProvider>,
    );
    const user = userEvent.setup();
    expect(screen.getByLabelText('Unit')).toHaveValue('US gal');
    await user.click(screen.getByLabelText('Work it out from the size'));
    expect(screen.getByLabelText('Measured in')).toHaveValue('in');
    await user.type(screen.getByLabelText('Length (side to side), in'), '36');
    await user.type(screen.getByLabelText('Depth (front to back), in'), '12');
    await user.type(screen.getByLabelText('Height, in'), '16');
    await user.type(screen.getByLabelText('Taken up by rock and sand, %'), '10');
    // 36 × 12 × 16 in = 6912 in³ = 29.9 US gal (113.3 L, shown whole above 100); 10 % rock and sand leaves 26.9 US gal.
    expect(screen.getByText(/Full to the brim/)).toHaveTextContent(
      'Full to the brim: 29.9 US gal (113 L). Water it holds: about 26.9 US gal (102 L).',
    );
  });
});
