import { cleanup, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { useSaveWaterTest } from '@client/features/readings/api/water-tests';
import { formatNumber } from '@shared/care/parameters';
import { REEF_PROFILE, TROPICAL_FRESHWATER_PROFILE } from '@shared/care/profiles';
import { normalizeWaterTest } from '@shared/readings/normalize-water-test';
import {
  WaterTestForm,
  type WaterTestFormProps,
} from '@client/features/readings/components/water-test/water-test-form';
import type { UnitPrefs } from '@client/lib/display-units';
import { newDraft } from '@client/features/readings/lib/water-test-draft';
import { ApiError } from '@client/lib/api-client';

const METRIC: UnitPrefs = { temperatureUnit: 'C', volumeUnit: 'L', salinityDisplay: 'sg' };

// The form saves through useSaveWaterTest; here its save stands in for the network (the hook has its own tests).
type SaveWaterTest = ReturnType<typeof useSaveWaterTest>;
const save = vi.hoisted(() => ({ onSave: undefined as unknown as SaveWaterTest }));
vi.mock('@client/features/readings/api/water-tests', () => ({ useSaveWaterTest: () => save.onSave }));

function renderForm(over: Partial<WaterTestFormProps> & { prefs?: UnitPrefs } = {}) {
  const prefs = over.prefs ?? METRIC;
  const onSave = vi.fn<SaveWaterTest>().mockResolvedValue({ message: 'Test saved.', warnings: [] });
  save.onSave = onSave;
  const props: WaterTestFormProps = {
    clubId: 'club-1',
    tank: {
      id: 'tank-1',
      systemType: 'reef',
      careProfileKey: 'reef',
      phase: 'established',
      volumeL: 200,
      hasLivestock: true,
    },
    lastKnown: {},
    profile: REEF_PROFILE,
    prefs,
    initial: newDraft(prefs, {}),
    memory: { parameters: ['temperature', 'salinity', 'pH', 'ammonia'], entries: {} },
    onSaved: () => {},
    ...over,
  };
  render(<WaterTestForm {...props} />);
  return { onSave, user: userEvent.setup() };
}

/** The parameter's block of the form (its fieldset). */
const block = (parameter: string) =>
  document.querySelector<HTMLElement>(`fieldset[data-parameter="${parameter}"]`)!;

describe('water-test form', () => {
  afterEach(cleanup);

  it('when SG 1.0245 is read at 25 °C on a refractometer referenced to 25 °C, then the preview shows the practical salinity the shared normalizer stores', async () => {
    const { user } = renderForm();
    await user.type(screen.getByLabelText('Temperature'), '25');
    const salinity = within(block('salinity'));
    expect(salinity.getByLabelText('Unit for Salinity')).toHaveValue('SG');
    await user.click(salinity.getByLabelText('Refractometer'));
    expect(salinity.getByLabelText("Instrument's reference temperature")).toHaveValue('25');
    await user.type(salinity.getByLabelText('Salinity'), '1.0245');

    const stored = normalizeWaterTest(
      {
        takenAt: new Date().toISOString(),
        entries: {
          temperature: { value: 25, unit: '°C' },
          salinity: { value: 1.0245, unit: 'SG', method: 'refractometer', referenceTempC: 25 },
        },
      },
      { systemType: 'reef', careProfileKey: 'reef', profile: REEF_PROFILE, now: new Date().toISOString() },
    ).values.salinity!;
    const preview = await screen.findByTestId('preview-salinity');
    expect(preview).toHaveTextContent(`Practical salinity ${formatNumber('salinity', stored)}`);
    // About 32.5 against the reef profile's 34–36: a little low, in words, with the band shown as SG (the member's choice).
    expect(preview).toHaveTextContent(/A little low: the ideal is 1\.02\d{2}–1\.02\d{2} SG\./);
  });

  it('when pH 80 is typed, then the plausibility message shows at once and saving is blocked', async () => {
    const { user, onSave } = renderForm();
    await user.type(screen.getByLabelText('pH'), '80');
    expect(within(block('pH')).getByRole('alert')).toHaveTextContent(
      'pH 80 is not possible — did you mean 8.0?',
    );
    expect(screen.getByText(/Fix the reading marked in red first/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save test' }));
    expect(onSave).not.toHaveBeenCalled();
    expect(screen.getByLabelText('pH')).toHaveValue('80');

    await user.clear(screen.getByLabelText('pH'));
    await user.type(screen.getByLabelText('pH'), '8,1');
    await user.click(screen.getByRole('button', { name: 'Save test' }));
    expect(onSave).toHaveBeenCalledTimes(1);
    expect(onSave.mock.calls[0]![0].entries.pH).toEqual({ value: 8.1, unit: 'pH' });
  });

  it('when a °F keeper types 77 °F on a freshwater tank, then the preview says what is stored in °C and judges it in °F', async () => {
    const prefs: UnitPrefs = { temperatureUnit: 'F', volumeUnit: 'USgal', salinityDisplay: 'ppt' };
    const { user, onSave } = renderForm({
      prefs,
      tank: {
        id: 'tank-2',
        systemType: 'tropical-freshwater',
        careProfileKey: 'tropical-freshwater',
        phase: 'established',
        volumeL: 200,
        hasLivestock: true,
      },
      profile: TROPICAL_FRESHWATER_PROFILE,
      memory: { parameters: ['temperature'], entries: {} },
    });
    expect(screen.getByLabelText('Unit for Temperature')).toHaveValue('°F');
    await user.type(screen.getByLabelText('Temperature'), '77');
    const preview = await screen.findByTestId('preview-temperature');
    expect(preview).toHaveTextContent('Saved as Temperature 25 °C.');
    expect(preview).toHaveTextContent(/°F/);
    await user.click(screen.getByRole('button', { name: 'Save test' }));
    expect(onSave.mock.calls[0]![0].entries.temperature).toEqual({ value: 77, unit: '°F' });
  });

  it('when nothing is entered, then saving names the missing reading and sends nothing', async () => {
    const { user, onSave } = renderForm();
    await user.click(screen.getByRole('button', { name: 'Save test' }));
    // The schema's own message, shown as an error at the top (the hint under the button says it before any click).
    expect(await screen.findByRole('alert')).toHaveTextContent('Enter at least one reading.');
    expect(onSave).not.toHaveBeenCalled();
  });

  it('when the server refuses a reading with a 400, then its message sits under that field, the typed values stay and saving again retries', async () => {
    const { user, onSave } = renderForm();
    onSave.mockRejectedValueOnce(
      new ApiError(400, 'bad_request', 'Some readings need attention.', [
        {
          path: 'entries.salinity.value',
          message:
            'Specific gravity 1.0245 with water at 40 °C is outside what fresh to very salty water reads.',
        },
      ]),
    );
    await user.type(screen.getByLabelText('Salinity'), '1.0245');
    await user.type(screen.getByLabelText('pH'), '8.2');
    await user.click(screen.getByRole('button', { name: 'Save test' }));
    expect(await within(block('salinity')).findByRole('alert')).toHaveTextContent(
      'Specific gravity 1.0245 with water at 40 °C',
    );
    expect(screen.getByLabelText('Salinity')).toHaveValue('1.0245');
    expect(screen.getByLabelText('pH')).toHaveValue('8.2');
    await user.click(screen.getByRole('button', { name: 'Save test' }));
    expect(onSave).toHaveBeenCalledTimes(2);
  });

  it('when opened from a link with the tests due, then those readings come first in that order, before the usual ones', () => {
    renderForm({ firstReadings: ['nitrite', 'ammonia'] });
    const order = [...document.querySelectorAll<HTMLElement>('fieldset[data-parameter]')].map(
      (f) => f.dataset.parameter,
    );
    // Due first, then the member's usual readings (remembered on the device) without repeats.
    expect(order).toEqual(['nitrite', 'ammonia', 'temperature', 'salinity', 'pH']);
  });

  it('when no tests are named, then the form starts with the usual readings as before', () => {
    renderForm();
    const order = [...document.querySelectorAll<HTMLElement>('fieldset[data-parameter]')].map(
      (f) => f.dataset.parameter,
    );
    expect(order).toEqual(['temperature', 'salinity', 'pH', 'ammonia']);
  });
});

describe('the concern preview on the form', () => {
  it('when nitrite 1.0 is typed on an established reef, then the form says it would be flagged as urgent before saving', async () => {
    const { user } = renderForm();
    await user.click(screen.getByRole('button', { name: /More readings/ }));
    await user.type(screen.getByRole('textbox', { name: /^Nitrite/ }), '1');
    const preview = await screen.findByRole('region', { name: 'If you save this' });
    expect(preview).toHaveTextContent(/Act now/);
    expect(preview).toHaveTextContent(/Nitrite/);
  });
});
