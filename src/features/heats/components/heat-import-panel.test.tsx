import { screen } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { json, stubApi } from '#src/testing/fetch-stub.ts';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { buildSession, buildUser, testId } from '#src/testing/data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { HeatImportPanel } from './heat-import-panel.tsx';

const workshopId = testId();
const importPath = `/api/workshops/${workshopId}/heats/import`;

// Their spreadsheet: our fields under other names, one extra column.
const CSV = ['Date,Metal,Charge lines,Pour temp (C),Weather', '2026-11-20T18:00:00Z,A356.0,ingot:1000,720,dry', '2026-11-21T18:00:00Z,Z999,ingot:800,,wet'].join('\n');

const readyRow = (row: number) => ({
  row,
  heat: { pouredAt: '2026-11-20T18:00:00.000Z', alloy: 'A356.0', pourTempC: 720, chargeLines: [{ kind: 'ingot', massG: 1000 }], castings: [] },
});

function setup(answer: (dryRun: boolean) => object) {
  const api = stubApi({ [`POST ${importPath}`]: ({ body }) => json(answer((body as { dryRun: boolean }).dryRun), { status: (body as { dryRun: boolean }).dryRun ? 200 : 201 }) });
  // A POST carries the session's CSRF token, read from the session query.
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(buildUser(), 'csrf-import'));
  const view = renderWithProviders(<HeatImportPanel workshopId={workshopId} units={{ temperatureUnit: 'C', massUnit: 'g' }} />, { queryClient });
  return { ...view, api };
}

async function paste(user: ReturnType<typeof setup>['user'], text: string) {
  const box = screen.getByLabelText('Or paste it here');
  await user.click(box);
  await user.paste(text);
}

describe('HeatImportPanel', () => {
  test('when a CSV is pasted, then its columns are matched to ours by name and sent as the mapping', async () => {
    const { user, api } = setup(() => ({ dryRun: true, preview: [readyRow(2)], errors: [], heatIds: [] }));

    await paste(user, CSV);

    expect(screen.getByLabelText(/^poured_at/)).toHaveValue('Date');
    expect(screen.getByLabelText(/^alloy/)).toHaveValue('Metal');
    expect(screen.getByLabelText(/^charge_lines/)).toHaveValue('Charge lines');
    expect(screen.getByLabelText(/^pour_temp_c/)).toHaveValue('Pour temp (C)');
    expect(screen.getByLabelText(/^notes/)).toHaveValue('');

    await user.selectOptions(screen.getByLabelText(/^notes/), 'Weather');
    await user.click(screen.getByRole('button', { name: 'Check every row' }));

    await expect.poll(() => api.to('POST', importPath).length).toBe(1);
    expect(api.to('POST', importPath)[0]!.body).toEqual({
      csv: CSV,
      dryRun: true,
      mapping: { poured_at: 'Date', alloy: 'Metal', charge_lines: 'Charge lines', pour_temp_c: 'Pour temp (C)', notes: 'Weather' },
    });
  });

  test('when the check finds a bad row, then the preview names it, says nothing will be written, and the import stays shut', async () => {
    const { user, api } = setup(() => ({
      dryRun: true,
      preview: [readyRow(2)],
      errors: [{ row: 3, field: 'alloy', message: '"Z999" is not an alloy in the library' }],
      heatIds: [],
    }));
    await paste(user, CSV);

    await user.click(screen.getByRole('button', { name: 'Check every row' }));

    expect(await screen.findByText(/1 row has problems; nothing will be imported until they are fixed/)).toBeInTheDocument();
    expect(screen.getByText(/"Z999" is not an alloy in the library/)).toBeInTheDocument();
    expect(screen.getByRole('rowheader', { name: '3' })).toBeInTheDocument();
    expect(screen.getByText('ready')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Import' })).toBeDisabled();
    expect(api.to('POST', importPath).every((r) => (r.body as { dryRun: boolean }).dryRun)).toBe(true);
  });

  test('when every row is ready, then the import sends the same file and mapping for real', async () => {
    const heatId = testId();
    const { user, api } = setup((dryRun) => ({ dryRun, preview: [readyRow(2), readyRow(3)], errors: [], heatIds: dryRun ? [] : [heatId, testId()] }));
    await paste(user, CSV);
    await user.click(screen.getByRole('button', { name: 'Check every row' }));
    expect(await screen.findByText('All 2 rows are ready')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Import 2 heats' }));

    expect(await screen.findByText('Imported 2 heats')).toBeInTheDocument();
    const [check, real] = api.to('POST', importPath);
    expect(real!.body).toEqual({ ...(check!.body as object), dryRun: false });
  });

  test('when the file changes after a check, then it must be checked again before importing', async () => {
    const { user } = setup(() => ({ dryRun: true, preview: [readyRow(2)], errors: [], heatIds: [] }));
    await paste(user, CSV);
    await user.click(screen.getByRole('button', { name: 'Check every row' }));
    await screen.findByText(/rows are ready/);

    await paste(user, '\n2026-11-22T18:00:00Z,A356.0,ingot:900,715,dry');

    expect(screen.getByRole('button', { name: 'Import' })).toBeDisabled();
    expect(screen.getByText(/changed since the last check; check again/)).toBeInTheDocument();
  });
});
