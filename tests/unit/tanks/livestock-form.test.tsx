import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AddLivestockForm } from '@client/features/tanks/components/livestock/livestock-forms';

describe('adding animals', () => {
  afterEach(cleanup);

  it('when animals are added, then the legal-sources and quarantine cautions are beside the form and the count is checked by the shared schema', async () => {
    const onSave = vi.fn().mockResolvedValue(undefined);
    render(<AddLivestockForm onSave={onSave} onCancel={() => {}} />);
    expect(screen.getByText(/legal, documented sources/)).toBeInTheDocument();
    expect(screen.getByText(/separate quarantine tank/)).toBeInTheDocument();
    const user = userEvent.setup();
    await user.type(screen.getByLabelText('Animal (common name)'), 'Lined seahorse');
    await user.clear(screen.getByLabelText('How many'));
    await user.type(screen.getByLabelText('How many'), '0');
    await user.click(screen.getByRole('button', { name: 'Add to the tank' }));
    expect(await screen.findByText('At least 1.')).toBeInTheDocument();
    expect(onSave).not.toHaveBeenCalled();
    await user.clear(screen.getByLabelText('How many'));
    await user.type(screen.getByLabelText('How many'), '2');
    await user.type(screen.getByLabelText('Where they came from'), 'Club breeder, captive-bred');
    await user.click(screen.getByRole('button', { name: 'Add to the tank' }));
    expect(onSave).toHaveBeenCalledWith(
      expect.objectContaining({
        speciesCommonName: 'Lined seahorse',
        count: 2,
        source: 'Club breeder, captive-bred',
        quarantineNotes: '',
      }),
    );
  });
});
