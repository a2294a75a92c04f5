import { screen, within } from '@testing-library/react';
import { describe, expect, test, vi } from 'vitest';
import { diagnose, findAlloy } from '#shared/domain/index.ts';
import { missingFieldsOf, type Diagnosis, type DiagnosisInput } from '#shared/reports/diagnosis-schemas.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { LikelyCausesView } from './likely-causes-view.tsx';

// A diagnosis as the server sends it: the trade core's own output for the input, plus the input and the missing list.
function diagnosisFor(input: DiagnosisInput): Diagnosis {
  const result = diagnose({ alloy: input.alloy ? findAlloy(input.alloy) : undefined, defects: input.defects, conditions: input.conditions });
  return {
    input,
    causes: result.causes,
    cautions: result.cautions,
    priorsNote: null,
    missing: missingFieldsOf(result.causes),
    ruleSet: { hash: 'h', custom: false },
  };
}

const GAS_NOT_DEGASSED: DiagnosisInput = { alloy: 'A356.0', defects: [{ kind: 'gas_porosity', severity: 2 }], conditions: { degassed: false, pourTempC: 720 } };

describe('LikelyCausesView', () => {
  test('when a heat was not degassed, then the top cause shows its evidence, score in words, status, fix and source', () => {
    // Arrange
    const diagnosis = diagnosisFor(GAS_NOT_DEGASSED);

    // Act
    renderWithProviders(<LikelyCausesView diagnosis={diagnosis} temperatureUnit="C" />);

    // Assert
    const top = screen.getByTestId('cause-degassing');
    expect(within(top).getByText(/the melt was not degassed/)).toBeInTheDocument();
    expect(within(top).getByRole('meter', { name: 'Degassing score' })).toHaveAttribute('aria-valuetext', expect.stringMatching(/of 100, (strong|moderate)/));
    expect(within(top).getByText('confirmed')).toBeInTheDocument();
    expect(within(top).getByText('Fix to try')).toBeInTheDocument();
    expect(within(top).getByText('Sources')).toBeInTheDocument();
  });

  test('when a field is not recorded, then it says so and records it inline with a PATCH-ready value', async () => {
    // Arrange
    const diagnosis = diagnosisFor(GAS_NOT_DEGASSED);
    const onRecord = vi.fn(async () => undefined);
    const { user } = renderWithProviders(
      <LikelyCausesView
        diagnosis={diagnosis}
        temperatureUnit="C"
        recording={{ temperatureUnit: 'C', context: { pouredAt: '2026-11-30T10:00:00.000Z' }, heatFormHref: '/x', onRecord }}
      />,
    );
    const humidity = screen.getByTestId('cause-humidity');

    // Act
    expect(within(humidity).getAllByText('not recorded')).toHaveLength(2); // air temperature and relative humidity
    await user.click(within(humidity).getByRole('button', { name: 'Record the relative humidity' }));
    await user.type(within(humidity).getByLabelText('Relative humidity'), '82');
    await user.click(within(humidity).getByRole('button', { name: 'Save relative humidity' }));

    // Assert
    expect(onRecord).toHaveBeenCalledWith([{ target: 'heat', values: { relativeHumidityPct: 82 } }]);
  });

  test('when a °F user reads evidence with a temperature, then the °F value stands beside the °C one', () => {
    // Arrange: a pour far too hot for A356 gives an evidence sentence with °C in it.
    const diagnosis = diagnosisFor({ alloy: 'A356.0', defects: [{ kind: 'gas_porosity', severity: 2 }], conditions: { pourTempC: 850, peakTempC: 880 } });

    // Act
    renderWithProviders(<LikelyCausesView diagnosis={diagnosis} temperatureUnit="F" />);

    // Assert
    expect(screen.getAllByText(/°C \(\d+ °F\)/).length).toBeGreaterThan(0);
  });

  test('when the what-if says the melt was degassed, then degassing drops down the ranking without saving', async () => {
    // Arrange
    const diagnosis = diagnosisFor(GAS_NOT_DEGASSED);
    const { user } = renderWithProviders(<LikelyCausesView diagnosis={diagnosis} temperatureUnit="C" withWhatIf />);
    const whatIf = screen.getByTestId('what-if');
    expect(within(whatIf).getByRole('heading', { name: 'What-if — not saved' })).toBeInTheDocument();
    expect(within(whatIf).getAllByTestId('what-if-row')[0]).toHaveTextContent('Degassing');

    // Act
    await user.selectOptions(within(whatIf).getByLabelText('Degassed'), 'yes');

    // Assert
    const rows = within(whatIf).getAllByTestId('what-if-row');
    expect(rows[0]).not.toHaveTextContent('Degassing');
    const degassing = rows.find((r) => r.textContent?.includes('Degassing'));
    expect(degassing).toHaveTextContent(/▼ down \d+ place/);
    // The recorded ranking above is untouched.
    expect(screen.getByTestId('cause-degassing')).toHaveTextContent('1.');
  });
});
