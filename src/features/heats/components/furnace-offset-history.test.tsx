import { screen, within } from '@testing-library/react';
import { Suspense } from 'react';
import { describe, expect, test } from 'vitest';
import { json, stubApi } from '#src/testing/fetch-stub.ts';
import { testId } from '#src/testing/data.ts';
import { buildHeatRow } from '#src/testing/heat-data.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { FurnaceOffsetHistory } from './furnace-offset-history.tsx';

const workshopId = testId();
const furnaceId = testId();

describe('FurnaceOffsetHistory', () => {
  test('when the furnace has heats with both readings, then the table beside the chart gives each offset in the user’s unit', async () => {
    const api = stubApi({
      [`GET /api/workshops/${workshopId}/heats`]: () =>
        json({
        items: [
          buildHeatRow({ setpointC: 740, pourTempC: 720, pouredAt: '2026-11-21T18:00:00.000Z' }),
          buildHeatRow({ setpointC: 750, pourTempC: 740, pouredAt: '2026-11-20T18:00:00.000Z' }),
          buildHeatRow({ setpointC: null, pourTempC: 700 }),
        ],
        nextCursor: null,
      }),
    });
    renderWithProviders(
      <Suspense fallback={<p>Loading</p>}>
        <FurnaceOffsetHistory workshopId={workshopId} furnaceId={furnaceId} units={{ temperatureUnit: 'F', massUnit: 'g' }} />
      </Suspense>,
    );

    const table = await screen.findByRole('table', { name: 'The same heats as a table' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(rows[0]).toHaveTextContent('1364 °F');
    expect(rows[0]).toHaveTextContent('1328 °F');
    expect(rows[0]).toHaveTextContent('-36 °F');
    expect(screen.getByRole('img', { name: /median -27 °F/ })).toBeInTheDocument();
    expect(api.to('GET', `/api/workshops/${workshopId}/heats`)[0]!.query.get('furnaceId')).toBe(furnaceId);
  });
});
