import { screen, within } from '@testing-library/react';
import { Suspense } from 'react';
import { describe, expect, test } from 'vitest';
import { json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildMember, testId } from '#src/testing/data.ts';
import { buildFurnace, buildHeatRow } from '#src/testing/heat-data.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { HEAT_COLUMNS_STORAGE_KEY } from './heat-table.tsx';
import { HeatLog } from './heat-log.tsx';

const workshopId = testId();
const base = `/api/workshops/${workshopId}`;
const furnace = buildFurnace({ name: 'Devil forge' });
const caster = buildMember({ displayName: 'Ray Dunmore', role: 'caster' });

function setup(search = '', { pages = [[buildHeatRow()]] }: { pages?: ReturnType<typeof buildHeatRow>[][] } = {}) {
  const api = stubApi({
    [`GET ${base}/heats`]: ({ query }) => {
      const page = query.get('cursor') ? Number(query.get('cursor')) : 0;
      return json({ items: pages[page] ?? [], nextCursor: page + 1 < pages.length ? String(page + 1) : null });
    },
  });
  const view = renderWithProviders(
    <Suspense fallback={<p>Loading</p>}>
      <HeatLog
        workshopId={workshopId}
        units={{ temperatureUnit: 'C', massUnit: 'g' }}
        choices={{ casters: [caster], furnaces: [furnace], crucibles: [] }}
        canLog
      />
    </Suspense>,
    { path: `/w/${workshopId}/heats${search}` },
  );
  const listRequests = () => api.to('GET', `${base}/heats`);
  return { ...view, api, listRequests };
}

describe('HeatLog', () => {
  test('when the URL carries filters, then the controls show them and the API is asked for them', async () => {
    const { listRequests } = setup('?alloy=A356.0&from=2026-11-01&casterId=' + caster.userId);

    await screen.findByRole('table', { name: /^Heats, sorted by poured/ });

    const filters = screen.getByRole('region', { name: 'Filters' });
    expect(within(filters).getByLabelText('Alloy')).toHaveValue('A356.0');
    expect(within(filters).getByLabelText('Caster')).toHaveValue(caster.userId);
    expect(within(filters).getByLabelText('Poured from')).toHaveValue('2026-11-01');
    const query = listRequests()[0]!.query;
    expect(Object.fromEntries(query)).toEqual({
      alloy: 'A356.0',
      casterId: caster.userId,
      from: '2026-11-01',
      sort: 'pouredAt',
      dir: 'desc',
      limit: '25',
    });
  });

  test('when a filter is chosen, then it lands in the URL beside the others and the list is asked again', async () => {
    const { user, router, listRequests } = setup('?alloy=A356.0');
    await screen.findByRole('table', { name: /^Heats/ });

    await user.selectOptions(within(screen.getByRole('region', { name: 'Filters' })).getByLabelText('Furnace'), furnace.id);

    await expect.poll(() => new URLSearchParams(router.state.location.search).get('furnaceId')).toBe(furnace.id);
    expect(new URLSearchParams(router.state.location.search).get('alloy')).toBe('A356.0');
    await expect.poll(() => listRequests().some((r) => r.query.get('furnaceId') === furnace.id && r.query.get('alloy') === 'A356.0')).toBe(true);
    await expect
      .poll(() => screen.getByRole('link', { name: 'Download these heats as CSV' }).getAttribute('href'))
      .toBe(`${base}/heats.csv?alloy=A356.0&furnaceId=${furnace.id}&sort=pouredAt&dir=desc`);
  });

  test('when a sortable header is pressed, then the sort goes to the URL and to the server', async () => {
    const { user, router, listRequests } = setup();
    const table = await screen.findByRole('table', { name: /^Heats/ });

    await user.click(within(table).getByRole('button', { name: /^Pour(?!ed)/ }));

    await expect.poll(() => router.state.location.search).toBe('?sort=pourTempC&dir=desc');
    await expect.poll(() => listRequests().some((r) => r.query.get('sort') === 'pourTempC' && r.query.get('dir') === 'desc')).toBe(true);
    await expect
      .poll(() => within(screen.getByRole('table', { name: /^Heats/ })).getByRole('columnheader', { name: /^Pour(?!ed)/ }).getAttribute('aria-sort'))
      .toBe('descending');
  });

  test('when filters are cleared, then the URL is clean again', async () => {
    const { user, router } = setup('?alloy=A356.0&to=2026-11-30');
    await screen.findByRole('table', { name: /^Heats/ });

    await user.click(screen.getByRole('button', { name: 'Clear all 2 filters' }));

    await expect.poll(() => router.state.location.search).toBe('');
  });

  test('when a column is hidden, then the choice is remembered for the next visit', async () => {
    const { user, unmount } = setup();
    const table = await screen.findByRole('table', { name: /^Heats/ });
    expect(within(table).getByRole('columnheader', { name: 'Caster' })).toBeInTheDocument();

    await user.click(screen.getByText('Columns'));
    await user.click(screen.getByRole('checkbox', { name: 'Caster' }));
    expect(within(table).queryByRole('columnheader', { name: 'Caster' })).not.toBeInTheDocument();
    expect(JSON.parse(localStorage.getItem(HEAT_COLUMNS_STORAGE_KEY) ?? '{}')).toMatchObject({ caster: false });
    unmount();

    setup();
    const again = await screen.findByRole('table', { name: /^Heats/ });
    expect(within(again).queryByRole('columnheader', { name: 'Caster' })).not.toBeInTheDocument();
  });

  test('when there are more heats, then "Load more" asks for the next page with the cursor', async () => {
    const { user, listRequests } = setup('', { pages: [[buildHeatRow()], [buildHeatRow({ alloy: '319.0' })]] });
    await screen.findByRole('table', { name: /^Heats/ });

    await user.click(screen.getByRole('button', { name: 'Load more heats' }));

    await expect.poll(() => listRequests().some((r) => r.query.get('cursor') === '1')).toBe(true);
    expect(await screen.findAllByText('319.0')).not.toHaveLength(0);
    expect(screen.queryByRole('button', { name: 'Load more heats' })).not.toBeInTheDocument();
  });
});
