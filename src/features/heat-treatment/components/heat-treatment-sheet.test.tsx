import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { findAlloy, heatTreatmentPlan, type TemperatureUnit } from '#shared/domain/index.ts';
import { compareToPlan } from '#shared/heat-treatment/compare-plan.ts';
import { heatTreatmentDetailSchema } from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { HeatTreatmentSheet } from './heat-treatment-sheet.tsx';

// The plan is the trade core's A356.0-T6 schedule (ASTM B917 as quoted:
// solution 540 °C for 6–12 h, water at 65–100 °C, age 155 °C for 3–5 h),
// shaped as the server answers, through the shared schema.
function a356T6() {
  const plan = heatTreatmentPlan(findAlloy('A356.0')!, 'T6')!;
  return heatTreatmentDetailSchema.parse({
    id: '00000000-0000-4000-8000-000000000101',
    workshopId: '00000000-0000-4000-8000-0000000000aa',
    casterId: '00000000-0000-4000-8000-000000000102',
    casterName: 'Sam Student',
    createdBy: '00000000-0000-4000-8000-000000000102',
    alloy: 'A356.0',
    temper: 'T6',
    oven: 'Pottery kiln',
    state: 'planned',
    castingCount: 1,
    createdAt: '2026-11-30T09:00:00.000Z',
    updatedAt: '2026-11-30T09:00:00.000Z',
    plan,
    notes: null,
    castings: [
      {
        id: '00000000-0000-4000-8000-000000000103',
        heatId: '00000000-0000-4000-8000-000000000104',
        heatPouredAt: '2026-11-20T18:00:00.000Z',
        heatAlloy: 'A356.0',
        number: 1,
        massG: 640,
        mouldName: 'Bracket pattern',
      },
    ],
    comparison: compareToPlan(plan, []),
    hardness: [],
    photos: [],
  });
}

function renderSheet(unit: TemperatureUnit) {
  renderWithProviders(<HeatTreatmentSheet plan={a356T6()} unit={unit} />);
  return screen.getAllByRole('listitem').filter((li) => within(li).queryByRole('heading', { level: 2 }));
}

describe('HeatTreatmentSheet', () => {
  test('when the reader works in °C, then every temperature shows in °C with °F beside it', () => {
    const [solution, quench, age] = renderSheet('C');

    expect(within(solution).getByRole('heading', { name: 'Step 1: Solution treatment' })).toBeInTheDocument();
    expect(within(solution).getByText('540 °C (1004 °F)')).toBeInTheDocument();
    expect(within(solution).getByText('6–12 h')).toBeInTheDocument();
    expect(within(quench).getByText('water at 65–100 °C (149–212 °F)')).toBeInTheDocument();
    expect(within(quench).getByText('15 s')).toBeInTheDocument();
    expect(within(age).getByText('155 °C (311 °F)')).toBeInTheDocument();
    expect(within(age).getByText('3–5 h')).toBeInTheDocument();
  });

  test('when the reader works in °F, then °F comes first and °C is beside it', () => {
    const [solution, quench, age] = renderSheet('F');

    expect(within(solution).getByText('1004 °F (540 °C)')).toBeInTheDocument();
    expect(within(quench).getByText('water at 149–212 °F (65–100 °C)')).toBeInTheDocument();
    expect(within(age).getByText('311 °F (155 °C)')).toBeInTheDocument();
  });

  test('when printed, then each step has blanks for the actual times and readings', () => {
    const [solution, quench] = renderSheet('C');

    expect(within(solution).getByLabelText('Load in at: blank to write in')).toBeInTheDocument();
    expect(within(solution).getByLabelText('Out at: blank to write in')).toBeInTheDocument();
    expect(within(quench).getByLabelText('Delay (s): blank to write in')).toBeInTheDocument();
    expect(within(quench).getByLabelText('Oven door open at: blank to write in')).toBeInTheDocument();
  });

  test('when the sheet shows, then the cautions are there: burns, quench and steam, the solidus, and deference to procedures', () => {
    renderSheet('F');
    const cautions = screen.getAllByRole('note');
    const text = cautions.map((c) => c.textContent ?? '').join(' ');

    expect(cautions.map((c) => within(c).getByText(/./, { selector: 'p[id]' }).textContent)).toEqual([
      'CautionHot parts and burns',
      'DangerQuench tanks and steam',
      'CautionKeep A356.0 below 1031 °F',
      'CautionYour supplier and your shop come first',
    ]);
    expect(text).toContain('Never pour water onto hot metal');
    expect(text).toContain('face shield');
    expect(text).toContain('ASTM B917');
    expect(text).toContain('AMS 2771');
  });
});
