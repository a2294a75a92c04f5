import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { findAlloy, heatTreatmentPlan } from '#shared/domain/index.ts';
import { compareToPlan } from '#shared/heat-treatment/compare-plan.ts';
import { heatTreatmentDetailSchema, type StepActual } from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { HeatTreatmentRecordView } from './heat-treatment-record-view.tsx';

const workshopId = '00000000-0000-4000-8000-0000000000aa';
const a356 = findAlloy('A356.0')!;
const plan = heatTreatmentPlan(a356, 'T6')!;

function detail(actuals: StepActual[]) {
  return heatTreatmentDetailSchema.parse({
    id: '00000000-0000-4000-8000-000000000501',
    workshopId,
    casterId: '00000000-0000-4000-8000-000000000502',
    casterName: 'Sam Student',
    createdBy: null,
    alloy: 'A356.0',
    temper: 'T6',
    oven: 'Pottery kiln',
    state: 'in_progress',
    castingCount: 0,
    createdAt: '2026-11-30T09:00:00.000Z',
    updatedAt: '2026-11-30T09:00:00.000Z',
    plan,
    notes: null,
    castings: [],
    comparison: compareToPlan(plan, actuals, { solidusC: a356.solidusC }),
    hardness: [],
    photos: [],
  });
}

const blank = { startedAt: null, endedAt: null, temperatureC: null, quenchMedium: null, quenchDelayS: null, notes: null };

describe('HeatTreatmentRecordView', () => {
  test('when the solution ran past the solidus and the quench was slow, then each step says so in the reader’s unit', () => {
    renderWithProviders(
      <HeatTreatmentRecordView
        workshopId={workshopId}
        plan={detail([
          { ...blank, stepIndex: 0, temperatureC: 560 },
          { ...blank, stepIndex: 1, quenchMedium: 'water', temperatureC: 80, quenchDelayS: 30 },
        ])}
        unit="F"
        mayRecord={false}
        photoOptions={[]}
      />,
    );

    const [solution, quench, age] = screen.getAllByRole('listitem').filter((li) => li.querySelector('h3'));
    expect(within(solution).getByText('Off the plan')).toBeInTheDocument();
    expect(within(solution).getByText(/read 1040 °F, at or above the alloy’s solidus \(1031 °F\)/)).toBeInTheDocument();
    expect(within(quench).getByText('Quench: 30 s from oven to tank, over the plan’s 15 s at most.')).toBeInTheDocument();
    expect(within(age).getByText('Not recorded')).toBeInTheDocument();
    expect(screen.getByText('2 deviations from the plan')).toBeInTheDocument();
  });

  test('when a mentor reads it, then there is nothing to record and it says who records', () => {
    renderWithProviders(<HeatTreatmentRecordView workshopId={workshopId} plan={detail([])} unit="C" mayRecord={false} photoOptions={[]} />);
    expect(screen.queryByText('Record this step')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add the reading' })).not.toBeInTheDocument();
    expect(screen.getByText('Sam Student or an admin records this plan; you can read it.')).toBeInTheDocument();
  });

  test('when the caster reads it, then each unrecorded step offers its form with the unit on the reading', () => {
    renderWithProviders(<HeatTreatmentRecordView workshopId={workshopId} plan={detail([])} unit="F" mayRecord photoOptions={[]} />);
    expect(screen.getAllByText('Record this step')).toHaveLength(3);
    expect(screen.getAllByRole('textbox', { name: /Oven reading/ })).toHaveLength(2);
    expect(screen.getAllByText('°F').length).toBeGreaterThanOrEqual(3);
  });
});
