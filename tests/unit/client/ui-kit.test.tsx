import { act, cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { TextField } from '@client/components/ui/field';
import { ToastProvider, useToast } from '@client/components/ui/toast';

describe('the UI kit', () => {
  afterEach(() => {
    cleanup();
    vi.useRealTimers();
  });

  it('when a field has a hint and an error, then the control is described by both and marked invalid', () => {
    render(<TextField label="Nitrate" hint="From the test kit's card." error="Enter a number." />);
    const input = screen.getByLabelText('Nitrate');
    expect(input).toHaveAttribute('aria-invalid', 'true');
    expect(input).toHaveAccessibleDescription("From the test kit's card. Enter a number.");
    expect(screen.getByRole('alert')).toHaveTextContent('Enter a number.');
  });

  it('when a field has no error, then it is not marked invalid and only the hint describes it', () => {
    render(<TextField label="Nitrate" hint="From the test kit's card." />);
    const input = screen.getByLabelText('Nitrate');
    expect(input).not.toHaveAttribute('aria-invalid');
    expect(input).toHaveAccessibleDescription("From the test kit's card.");
  });

  function SaveButton() {
    const toast = useToast();
    return (
      <>
        <button type="button" onClick={() => toast.success('Test saved.')}>
          Save
        </button>
        <button type="button" onClick={() => toast.error('Could not save.')}>
          Fail
        </button>
      </>
    );
  }

  it('when an action toasts, then the message appears in a live region that was there before it, and goes after a while', async () => {
    vi.useFakeTimers({ shouldAdvanceTime: true });
    render(
      <ToastProvider>
        <SaveButton />
      </ToastProvider>,
    );
    const polite = screen.getByRole('status');
    const urgent = screen.getByRole('alert');
    expect(polite).toHaveAttribute('aria-live', 'polite');
    expect(urgent).toHaveAttribute('aria-live', 'assertive');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    await userEvent.click(screen.getByRole('button', { name: 'Fail' }));
    expect(polite).toHaveTextContent('Test saved.');
    expect(urgent).toHaveTextContent('Could not save.');
    await act(() => vi.advanceTimersByTimeAsync(7_000));
    expect(polite).toHaveTextContent('');
    expect(urgent).toHaveTextContent('');
  });
});
