import { screen, within } from '@testing-library/react';
import { describe, expect, test, vi } from 'vitest';
import { renderWithProviders } from '#src/testing/render.tsx';
import { DefectPicker } from './defect-picker.tsx';

function setup(initial?: Parameters<typeof DefectPicker>[0]['initial']) {
  const onSave = vi.fn();
  const onCancel = vi.fn();
  const view = renderWithProviders(
    <DefectPicker title="Mark a defect" saveLabel="Save mark" initial={initial} onSave={onSave} onCancel={onCancel} />,
  );
  const kinds = () => within(screen.getByRole('group', { name: /^Defect/ })).getAllByRole('radio') as HTMLInputElement[];
  return { ...view, onSave, onCancel, kinds, search: screen.getByRole('searchbox', { name: 'Find the defect' }) };
}

describe('DefectPicker', () => {
  test('when it opens, then the search has focus and every kind is offered with how to recognise it', async () => {
    const { search, kinds } = setup();
    expect(search).toHaveFocus();
    expect(kinds()).toHaveLength(24);
    expect(screen.getByText(/Round holes with smooth, often shiny walls/)).toBeInTheDocument();
  });

  test('when someone types "bubles", then gas porosity is offered, and Enter takes the best match', async () => {
    const { user, search, onSave, kinds } = setup();

    await user.type(search, 'bubles');
    const offered = kinds().map((r) => r.value);
    expect(offered.slice(0, 3)).toContain('gas_porosity');
    await user.keyboard('{Enter}');
    const best = kinds()[0];
    expect(best).toBeChecked();
    expect(onSave).not.toHaveBeenCalled();

    await user.click(screen.getByRole('button', { name: 'Save mark' }));
    expect(onSave).toHaveBeenCalledWith({ kind: best.value, severity: 2, note: '' });
  });

  test('when "divot" is searched, a severity chosen and a note written, then the save carries all three', async () => {
    const { user, search, onSave } = setup();

    await user.type(search, 'divot');
    await user.click(screen.getByRole('radio', { name: /Shrinkage sink/ }));
    await user.click(screen.getByRole('radio', { name: /3 Serious/ }));
    await user.type(screen.getByRole('textbox', { name: /Note/ }), 'over the boss');
    await user.click(screen.getByRole('button', { name: 'Save mark' }));

    expect(onSave).toHaveBeenCalledWith({ kind: 'shrinkage_sink', severity: 3, note: 'over the boss' });
  });

  test('when Save is pressed before a defect is chosen, then it asks for one and keeps the picker open', async () => {
    const { user, search, onSave } = setup();
    await user.click(screen.getByRole('button', { name: 'Save mark' }));
    expect(onSave).not.toHaveBeenCalled();
    expect(screen.getByText('Choose which defect this is.')).toBeInTheDocument();
    expect(search).toHaveFocus();
  });

  test('when a mark is being changed, then its kind is chosen already and "/" jumps to the search', async () => {
    const { user, search } = setup({ kind: 'cold_shut', severity: 1, note: '' });
    expect(screen.getByRole('radio', { name: /Cold shut/ })).toBeChecked();
    await user.keyboard('/');
    expect(search).toHaveFocus();
  });
});
