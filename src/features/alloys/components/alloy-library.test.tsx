import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import type { AlloyEntry } from '#shared/alloys/alloy-schemas.ts';
import { ALLOYS, findAlloy, formatTemperature, fToC } from '#shared/domain/index.ts';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser } from '#src/testing/data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import type { Units } from '#src/lib/unit-input.ts';
import { AlloyLibrary } from './alloy-library.tsx';

const workshopId = '00000000-0000-4000-8000-0000000000a1';
const entries: AlloyEntry[] = ALLOYS.map((alloy) => ({
  origin: 'library',
  id: null,
  alloy,
  createdBy: null,
  createdByName: null,
  createdAt: null,
  updatedAt: null,
}));

function setup({ mayEdit = false, units = { temperatureUnit: 'F', massUnit: 'g' } }: { mayEdit?: boolean; units?: Units } = {}) {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(buildUser(), 'csrf-alloys'));
  return renderWithProviders(<AlloyLibrary workshopId={workshopId} entries={entries} units={units} mayEdit={mayEdit} />, { queryClient });
}

const bodyRows = () => within(screen.getByRole('table')).getAllByRole('row').slice(1);
const rowNames = () => bodyRows().map((r) => within(r).getByRole('rowheader').querySelector('.figures')?.textContent);

describe('AlloyLibrary', () => {
  test('when the liquidus header is pressed twice, then rows sort ascending then descending, in °F', async () => {
    const { user } = setup();

    await user.click(screen.getByRole('button', { name: /Liquidus \(°F\)/ }));
    expect(rowNames()[0]).toBe('Pure Sn');
    expect(screen.getByRole('columnheader', { name: /Liquidus/ })).toHaveAttribute('aria-sort', 'ascending');

    await user.click(screen.getByRole('button', { name: /Liquidus \(°F\)/ }));
    expect(rowNames()[0]).toBe('Grey iron');
    expect(screen.getByRole('columnheader', { name: /Liquidus/ })).toHaveAttribute('aria-sort', 'descending');
    expect(within(bodyRows()[0]).getByText(formatTemperature(1200, 'F'))).toBeInTheDocument();
  });

  test('when someone searches "tenzalloy" (misspelt), then 713.0 comes first', async () => {
    const { user } = setup();

    await user.type(screen.getByRole('searchbox', { name: 'Search alloys' }), 'tenzalloy');

    expect(rowNames()[0]).toBe('713.0');
    expect(screen.getByText(/of \d+ alloys match/)).toBeInTheDocument();
  });

  test('when a row’s sources are opened, then each value’s citation shows without hovering', async () => {
    const { user } = setup();

    await user.click(screen.getByRole('button', { name: 'Sources for A356.0' }));

    const a356 = findAlloy('A356.0')!;
    expect(screen.getByRole('heading', { name: 'Where the values for A356.0 come from' })).toBeInTheDocument();
    expect(screen.getByText(a356.sources.solidusLiquidus!.citation, { exact: false })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: /Hide sources/ })).toHaveAttribute('aria-expanded', 'true');
  });

  test('when a member who is not an admin looks, then there is no add button and the note says who can', () => {
    setup();
    expect(screen.queryByRole('button', { name: 'Add a workshop alloy' })).not.toBeInTheDocument();
    expect(screen.getByText(/An admin of this workshop can add it/)).toBeInTheDocument();
  });

  test('when an admin adds wheel scrap based on A356.0 and changes only the liquidus in °F, then only that value is sent, in °C', async () => {
    const api = stubApi({
      [`POST /api/workshops/${workshopId}/alloys`]: ({ body }) =>
        json(
          {
            ...entries[0],
            origin: 'workshop',
            id: '00000000-0000-4000-8000-0000000000b2',
            alloy: { ...findAlloy('A356.0')!, designation: (body as { designation: string }).designation, basedOn: 'A356.0', source: 'wheels' },
          },
          { status: 201 },
        ),
    });
    const { user } = setup({ mayEdit: true });

    await user.click(screen.getByRole('button', { name: 'Add a workshop alloy' }));
    const form = screen.getByRole('form', { name: 'Add a workshop alloy' });
    await user.type(within(form).getByRole('textbox', { name: /Designation/ }), 'Wheel scrap');
    await user.selectOptions(within(form).getByRole('combobox', { name: /Based on/ }), 'A356.0');
    const liquidus = within(form).getByRole('textbox', { name: /Liquidus/ });
    expect(liquidus).toHaveValue('1139');
    await user.clear(liquidus);
    await user.type(liquidus, '1145');
    await user.type(within(form).getByRole('textbox', { name: /Where these values come from/ }), 'Cast wheels, assumed A356');
    await user.click(within(form).getByRole('button', { name: 'Add alloy' }));

    await expect.poll(() => api.to('POST', `/api/workshops/${workshopId}/alloys`).length).toBe(1);
    const sent = api.to('POST', `/api/workshops/${workshopId}/alloys`)[0].body as Record<string, unknown>;
    expect(sent).toEqual({ designation: 'Wheel scrap', basedOn: 'A356.0', liquidusC: fToC(1145), source: 'Cast wheels, assumed A356' });
    expect(await screen.findByText('Wheel scrap added to the library')).toBeInTheDocument();
  });

  test('when an admin enters a solidus above the liquidus, then the form says so under the field and sends nothing', async () => {
    const api = stubApi({});
    const { user } = setup({ mayEdit: true, units: { temperatureUnit: 'C', massUnit: 'g' } });

    await user.click(screen.getByRole('button', { name: 'Add a workshop alloy' }));
    const form = screen.getByRole('form', { name: 'Add a workshop alloy' });
    await user.type(within(form).getByRole('textbox', { name: /Designation/ }), 'Odd bar');
    await user.selectOptions(within(form).getByRole('combobox', { name: /Family/ }), 'aluminium');
    await user.type(within(form).getByRole('textbox', { name: /Solidus/ }), '650');
    await user.type(within(form).getByRole('textbox', { name: /Liquidus/ }), '600');
    await user.type(within(form).getByRole('textbox', { name: /Density/ }), '2.7');
    await user.type(within(form).getByRole('textbox', { name: /Where these values come from/ }), 'guessing');
    await user.click(within(form).getByRole('button', { name: 'Add alloy' }));

    expect(await within(form).findByText('solidus must not exceed liquidus')).toBeInTheDocument();
    expect(api.requests).toHaveLength(0);
  });
});
