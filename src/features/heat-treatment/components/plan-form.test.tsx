import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { findAlloy, heatTreatmentPlan, tempersFor } from '#shared/domain/index.ts';
import { compareToPlan } from '#shared/heat-treatment/compare-plan.ts';
import { candidateCastingSchema, heatTreatmentDetailSchema } from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { buildSession, buildUser } from '#src/testing/data.ts';
import { json, stubApi } from '#src/testing/fetch-stub.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { PlanForm } from './plan-form.tsx';

const workshopId = '00000000-0000-4000-8000-0000000000aa';
const base = `/api/workshops/${workshopId}/heat-treatments`;
const casting = (id: string, heatAlloy: string, number: number) =>
  candidateCastingSchema.parse({
    id,
    heatId: '00000000-0000-4000-8000-000000000201',
    heatPouredAt: '2026-11-20T18:00:00.000Z',
    heatAlloy,
    number,
    massG: 640,
    mouldName: null,
    casterId: '00000000-0000-4000-8000-000000000202',
    casterName: 'Sam Student',
    openPlanIds: [],
  });
const a356 = casting('00000000-0000-4000-8000-000000000301', 'A356.0', 1);
const other = casting('00000000-0000-4000-8000-000000000302', '319.0', 2);

describe('PlanForm', () => {
  test('when the alloy is A356.0, then the tempers are the trade core’s and only A356.0 castings are offered', async () => {
    renderWithProviders(<PlanForm workshopId={workshopId} candidates={[a356, other]} units={{ temperatureUnit: 'C', massUnit: 'g' }} />);

    const temper = screen.getByRole('combobox', { name: /Temper/ });
    expect(within(temper).getAllByRole('option').map((o) => o.textContent)).toEqual(tempersFor(findAlloy('A356.0')!));
    expect(screen.getAllByRole('checkbox')).toHaveLength(1);
    expect(screen.getByRole('region', { name: 'The steps of this plan' })).toHaveTextContent('540 °C (1004 °F)');
  });

  test('when the student saves, then the plan is sent with the chosen castings', async () => {
    const plan = heatTreatmentPlan(findAlloy('A356.0')!, 'T6')!;
    const api = stubApi({
      [`POST ${base}`]: () =>
        json(
          heatTreatmentDetailSchema.parse({
            id: '00000000-0000-4000-8000-000000000401',
            workshopId,
            casterId: a356.casterId,
            casterName: 'Sam Student',
            createdBy: a356.casterId,
            alloy: 'A356.0',
            temper: 'T6',
            oven: 'Pottery kiln',
            state: 'planned',
            castingCount: 1,
            createdAt: '2026-11-30T09:00:00.000Z',
            updatedAt: '2026-11-30T09:00:00.000Z',
            plan,
            notes: null,
            castings: [],
            comparison: compareToPlan(plan, []),
            hardness: [],
            photos: [],
          }),
          { status: 201 },
        ),
      [`GET ${base}`]: [],
      [`GET ${base}/candidates`]: [],
    });
    const queryClient = createTestQueryClient();
    queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(buildUser({ id: a356.casterId }), 'csrf-plan'));
    const { user, router } = renderWithProviders(
      <PlanForm workshopId={workshopId} candidates={[a356]} units={{ temperatureUnit: 'C', massUnit: 'g' }} />,
      { queryClient },
    );

    await user.click(screen.getByRole('checkbox'));
    await user.type(screen.getByRole('textbox', { name: /Oven or kiln/ }), 'Pottery kiln');
    await user.click(screen.getByRole('button', { name: 'Save the plan' }));

    await expect.poll(() => api.to('POST', base).length).toBe(1);
    expect(api.to('POST', base)[0].headers.get('x-csrf-token')).toBe('csrf-plan');
    expect(api.to('POST', base)[0].body).toMatchObject({ alloy: 'A356.0', temper: 'T6', castingIds: [a356.id], oven: 'Pottery kiln' });
    await expect.poll(() => router.state.location.pathname).toBe(`/w/${workshopId}/heat-treatment/00000000-0000-4000-8000-000000000401`);
  });
});
