import { screen, within } from '@testing-library/react';
import { Suspense } from 'react';
import { describe, expect, test } from 'vitest';
import { ozToG } from '#shared/domain/index.ts';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser, testId } from '#src/testing/data.ts';
import { buildCrucible, buildFurnace } from '#src/testing/heat-data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { EquipmentOverview } from './equipment-overview.tsx';

const workshopId = testId();
const base = `/api/workshops/${workshopId}`;
const limits = ['clay_graphite', 'silicon_carbide', 'steel', 'ceramic', 'other'].map((material) => ({ material, warnAt: 15, limitAt: 20, isDefault: true }));

function setup({ canManage = true, crucibles = [buildCrucible()] } = {}) {
  const api = stubApi({
    [`GET ${base}/furnaces`]: [buildFurnace()],
    [`GET ${base}/crucibles`]: () => json(crucibles),
    [`GET ${base}/moulds`]: [],
    [`GET ${base}/crucible-limits`]: limits,
    [`POST ${base}/crucibles`]: ({ body }) => json({ ...buildCrucible(body as object), notes: [] }, { status: 201 }),
    [`PATCH ${base}/crucibles/${crucibles[0]?.id}`]: ({ body }) => json({ ...crucibles[0], ...(body as object), status: 'retired', notes: [] }),
  });
  // Writes carry the session's CSRF token.
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(buildUser(), 'csrf-equipment'));
  const view = renderWithProviders(
    <Suspense fallback={<p>Loading</p>}>
      <EquipmentOverview workshopId={workshopId} units={{ temperatureUnit: 'C', massUnit: 'oz' }} canManage={canManage} canSetLimits={false} />
    </Suspense>,
    { queryClient },
  );
  return { ...view, api };
}

describe('EquipmentOverview', () => {
  test('when a crucible is near its limit, then its cycles read in words beside the bar', async () => {
    setup({ crucibles: [buildCrucible({ name: 'Old faithful', cycleCount: 16, status: 'near-limit' })] });

    const item = (await screen.findByRole('link', { name: 'Old faithful' })).closest('li')!;
    expect(item).toHaveTextContent('16 of 20 heats');
    expect(within(item).getByText('near its limit')).toBeInTheDocument();
  });

  test('when an ounce user adds a crucible, then its capacity reaches the API in grams', async () => {
    const { user, api } = setup();
    await user.click(await screen.findByRole('button', { name: 'Add a crucible' }));
    const form = screen.getByRole('form', { name: 'Add a crucible' });

    await user.type(within(form).getByLabelText('Name'), 'A8 salamander');
    await user.type(within(form).getByLabelText('Capacity'), '105.8');
    await user.click(within(form).getByRole('button', { name: 'Add the crucible' }));

    await expect.poll(() => api.to('POST', `${base}/crucibles`).length).toBe(1);
    const body = api.to('POST', `${base}/crucibles`)[0]!.body as { capacityG: number; name: string; material: string };
    expect(body.capacityG).toBeCloseTo(ozToG(105.8), 9);
    expect(body).toMatchObject({ name: 'A8 salamander', material: 'clay_graphite' });
  });

  test('when a used crucible is retired, then it asks once and sends retired: true; it is never offered for deletion', async () => {
    const crucible = buildCrucible({ name: 'Cracked pot', cycleCount: 4 });
    const { user, api } = setup({ crucibles: [crucible] });
    const item = (await screen.findByRole('link', { name: 'Cracked pot' })).closest('li')!;
    expect(within(item).queryByRole('button', { name: /Delete/ })).not.toBeInTheDocument();

    await user.click(within(item).getByRole('button', { name: 'Retire Cracked pot' }));
    await user.click(within(item).getByRole('button', { name: 'Yes, retire it' }));

    await expect.poll(() => api.to('PATCH', `${base}/crucibles/${crucible.id}`).length).toBe(1);
    expect(api.to('PATCH', `${base}/crucibles/${crucible.id}`)[0]!.body).toEqual({ retired: true });
  });

  test('when a student opens the page, then there are no add, edit or retire controls', async () => {
    setup({ canManage: false });
    await screen.findByRole('heading', { name: 'Crucibles' });
    expect(screen.queryByRole('button', { name: /^Add a / })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Edit/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Retire/ })).not.toBeInTheDocument();
  });
});
