import { screen } from '@testing-library/react';
import { describe, expect, test, vi } from 'vitest';
import { renderWithProviders } from '#src/testing/render.tsx';
import { ReportActions } from './report-actions.tsx';

describe('ReportActions', () => {
  test.each([
    [['submit'], ['Submit to a mentor']],
    [['withdraw'], ['Withdraw to edit']],
    [['start_review'], ['Start the review']],
    [['resolve'], ['Resolve with confirmed causes']],
    [['reopen'], ['Reopen']],
    [[], []],
  ] as const)('when the server allows %j, then only those buttons show', (allowed, labels) => {
    // Arrange, Act
    renderWithProviders(<ReportActions allowedActions={allowed} onTransition={vi.fn()} />);

    // Assert
    const buttons = screen.queryAllByRole('button').map((b) => b.textContent);
    expect(buttons).toEqual(labels);
  });

  test('when a reviewer resolves, then the causes picked, their fixes and the conclusion are sent', async () => {
    // Arrange
    const onTransition = vi.fn(async () => undefined);
    const { user } = renderWithProviders(<ReportActions allowedActions={['resolve']} rankedVariables={['degassing', 'humidity']} onTransition={onTransition} />);

    // Act
    await user.click(screen.getByRole('button', { name: 'Resolve with confirmed causes' }));
    await user.click(screen.getByRole('checkbox', { name: 'Degassing' }));
    await user.type(screen.getByLabelText('Fixes to try'), 'Degas with argon for 10 min');
    await user.type(screen.getByLabelText('What you concluded'), 'Hydrogen from an undegassed melt.');
    await user.click(screen.getByRole('button', { name: 'Resolve the report' }));

    // Assert
    expect(onTransition).toHaveBeenCalledWith({
      action: 'resolve',
      note: 'Hydrogen from an undegassed melt.',
      causes: [{ variable: 'degassing', note: '', fixesToTry: ['Degas with argon for 10 min'] }],
    });
  });

  test('when resolving with no cause picked, then it says so and sends nothing', async () => {
    // Arrange
    const onTransition = vi.fn();
    const { user } = renderWithProviders(<ReportActions allowedActions={['resolve']} onTransition={onTransition} />);

    // Act
    await user.click(screen.getByRole('button', { name: 'Resolve with confirmed causes' }));
    await user.type(screen.getByLabelText('What you concluded'), 'Not sure yet');
    await user.click(screen.getByRole('button', { name: 'Resolve the report' }));

    // Assert
    expect(screen.getByRole('alert')).toHaveTextContent('Confirm at least one cause');
    expect(onTransition).not.toHaveBeenCalled();
  });
});
