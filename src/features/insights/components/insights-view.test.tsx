import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import {
  crucibleCyclesSchema,
  defectFrequencySchema,
  defectRateByBandSchema,
  furnaceOffsetSchema,
  yieldTrendSchema,
} from '#shared/insights/insight-schemas.ts';
import { stubApi } from '#src/testing/fetch-stub.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { InsightsView } from './insights-view.tsx';

const workshopId = '00000000-0000-4000-8000-0000000000aa';
const base = `/api/workshops/${workshopId}/insights`;
const heatId = '00000000-0000-4000-8000-0000000000b1';
const crucibleId = '00000000-0000-4000-8000-0000000000c1';
const furnaceId = '00000000-0000-4000-8000-0000000000d1';

// Answers as the server sends them, checked against the shared schemas so a
// contract change breaks this test rather than the page.
const frequency = defectFrequencySchema.parse({
  months: [
    { month: '2026-09', castings: 3, kinds: [{ kind: 'gas_porosity', castings: 2, marks: 5 }] },
    { month: '2026-10', castings: 1, kinds: [] },
  ],
  kinds: ['gas_porosity'],
});
const band = (bandWidthC: number) =>
  defectRateByBandSchema.parse({
    alloy: 'A356.0',
    bandWidthC,
    by: 'group',
    keys: ['gas', 'shrinkage', 'filling', 'inclusion', 'surface', 'crack', 'dimensional'],
    bands: [
      {
        fromC: 700,
        toC: 720,
        heats: 2,
        castings: 4,
        rates: ['gas', 'shrinkage', 'filling', 'inclusion', 'surface', 'crack', 'dimensional'].map((key) => ({
          key,
          castings: key === 'gas' ? 1 : 0,
          share: key === 'gas' ? 0.25 : 0,
        })),
      },
    ],
    unrecorded: { castings: 1 },
  });
const yields = yieldTrendSchema.parse({
  months: [{ month: '2026-09', heats: 2, medianPct: 62.5, meanPct: 60 }],
  excluded: 1,
  source: 'Giesserei-Lexikon (online foundry encyclopaedia), "Output" (Ausbringen)',
});
const crucibles = crucibleCyclesSchema.parse({
  crucibles: [
    {
      id: crucibleId,
      name: 'A6 clay-graphite',
      material: 'clay_graphite',
      cycleCount: 9,
      warnAt: 15,
      limitAt: 20,
      inServiceSince: '2026-09-01',
      retiredOn: null,
      points: [{ heatId, pouredAt: '2026-09-05T10:00:00.000Z', cycle: 7 }],
      notes: [{ id: '00000000-0000-4000-8000-0000000000e1', notedOn: '2026-09-10', note: 'Hairline crack at the rim' }],
    },
  ],
});
const furnaces = furnaceOffsetSchema.parse({
  furnaces: [
    {
      id: furnaceId,
      name: 'Electric kiln',
      kind: 'electric',
      medianOffsetC: -20,
      points: [{ heatId, pouredAt: '2026-09-05T10:00:00.000Z', setpointC: 740, pourTempC: 720, offsetC: -20 }],
    },
  ],
});

function setup(path: string, overrides: Record<string, object> = {}) {
  const api = stubApi({
    [`GET ${base}/defect-frequency`]: frequency,
    [`GET ${base}/defect-rate-by-pour-band`]: band(20),
    [`GET ${base}/defect-rate-by-mould-preheat-band`]: band(50),
    [`GET ${base}/yield-trend`]: yields,
    [`GET ${base}/crucible-cycles`]: crucibles,
    [`GET ${base}/furnace-offset`]: furnaces,
    ...overrides,
  });
  const view = renderWithProviders(<InsightsView workshopId={workshopId} unit="F" casters={[]} />, { path });
  return { ...view, api };
}

describe('InsightsView', () => {
  test('when the data arrives, then every chart has its table, with links to the gallery and the heat log', async () => {
    setup('/?alloy=A356.0');

    const frequencyTable = await screen.findByRole('table', { name: /Castings with each defect kind/ });
    const row = within(frequencyTable).getByRole('row', { name: /Gas porosity/ });
    expect(within(row).getAllByRole('cell').map((c) => c.textContent)).toContain('5');
    expect(within(row).getByRole('link', { name: /Photos/ })).toHaveAttribute(
      'href',
      `/w/${workshopId}/gallery?kind=gas_porosity&from=2026-09-01&to=2026-09-30&alloy=A356.0`,
    );

    const yieldTable = await screen.findByRole('table', { name: /Casting yield by month/ });
    expect(within(yieldTable).getByText('62.5 %')).toBeInTheDocument();
    expect(within(yieldTable).getByRole('link', { name: /Heats/ })).toHaveAttribute(
      'href',
      `/w/${workshopId}/heats?alloy=A356.0&from=2026-09-01&to=2026-09-30`,
    );

    const history = await screen.findByRole('table', { name: /Crucible history/ });
    expect(within(history).getByText('Note: Hairline crack at the rim')).toBeInTheDocument();
    expect(within(history).getByRole('link', { name: /Heat on A6 clay-graphite/ })).toHaveAttribute(
      'href',
      `/w/${workshopId}/heats?crucibleId=${crucibleId}&from=2026-09-05&to=2026-09-05&alloy=A356.0`,
    );
  });

  test('when the reader uses °F, then bands and offsets are in °F', async () => {
    setup('/?alloy=A356.0');

    const pourTable = await screen.findByRole('table', { name: /Defects by pour temperature/ });
    // 700–720 °C is 1292–1328 °F.
    expect(within(pourTable).getByRole('rowheader', { name: '1292–1328 °F' })).toBeInTheDocument();
    expect(within(pourTable).getByText('1 (25 %)')).toBeInTheDocument();
    const offsetTable = await screen.findByRole('table', { name: /Furnace offset per heat/ });
    // −20 °C of offset is −36 °F (a difference: no 32 °F shift).
    expect(within(offsetTable).getByText('−36 °F')).toBeInTheDocument();
    expect(within(offsetTable).getByText('1328 °F')).toBeInTheDocument();
  });

  test('when no alloy is chosen, then the pour-temperature panel asks for one and is not fetched', async () => {
    const { api } = setup('/');
    const panel = await screen.findByRole('region', { name: 'Defects by pour temperature' });
    expect(within(panel).getByText('Choose an alloy above to compare pour temperatures.')).toBeInTheDocument();
    await screen.findByRole('table', { name: /Casting yield by month/ });
    expect(api.to('GET', `${base}/defect-rate-by-pour-band`)).toHaveLength(0);
  });

  test('when nothing is marked yet, then the panel says what to log first', async () => {
    setup('/', { [`GET ${base}/defect-frequency`]: { months: [], kinds: [] } });
    const panel = await screen.findByRole('region', { name: 'Defects by month' });
    expect(await within(panel).findByText('No marked defects in this view yet.')).toBeInTheDocument();
    expect(within(panel).getByRole('link', { name: 'gallery' })).toHaveAttribute('href', `/w/${workshopId}/gallery`);
  });

  test('when the reader switches a panel to its table, then the table shows and the chart is gone', async () => {
    const { user } = setup('/');
    const panel = await screen.findByRole('region', { name: 'Casting yield by month' });
    const table = await within(panel).findByRole('table');
    expect(table.parentElement).toHaveClass('sr-only');
    await user.click(within(panel).getByRole('radio', { name: 'Table' }));
    expect(within(panel).getByRole('table').parentElement).not.toHaveClass('sr-only');
  });

  test('when a filter changes, then it goes into the URL and the insights are asked again with it', async () => {
    const { user, api, router } = setup('/');
    await screen.findByRole('table', { name: /Casting yield by month/ });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Alloy' }), 'A356.0');
    await expect.poll(() => router.state.location.search).toBe('?alloy=A356.0');
    await expect.poll(() => api.to('GET', `${base}/defect-rate-by-pour-band`).length).toBe(1);
  });
});
