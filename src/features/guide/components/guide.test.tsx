import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { DEFAULT_RULES, DEFECT_GROUPS, findDefectKind } from '#shared/domain/index.ts';
import type { Photo } from '#shared/photos/photo-schemas.ts';
import { stubApi } from '#src/testing/fetch-stub.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { DefectKindGuide } from './defect-kind-guide.tsx';
import { GuideIndex } from './guide-index.tsx';

const workshopId = '00000000-0000-4000-8000-0000000000c1';

function photo(overrides: Partial<Photo> = {}): Photo {
  const id = '00000000-0000-4000-8000-0000000000d1';
  return {
    id,
    workshopId,
    castingId: '00000000-0000-4000-8000-0000000000d2',
    heatId: '00000000-0000-4000-8000-0000000000d3',
    uploadedBy: null,
    casterId: null,
    casterName: 'Jonah Pike',
    title: 'Ingot top, Thursday',
    notes: null,
    fileName: 'ingot.jpg',
    alloy: 'A356.0',
    mouldMaterial: 'steel',
    capturedAt: null,
    createdAt: '2026-11-20T18:00:00.000Z',
    original: { width: 4000, height: 3000 },
    display: { width: 1600, height: 1200 },
    thumb: { width: 400, height: 300 },
    urls: { original: `/api/p/${id}/original`, display: `/api/p/${id}/display`, thumb: `/api/p/${id}/thumb` },
    marks: [],
    ...overrides,
  };
}

describe('GuideIndex', () => {
  test('when nothing is typed, then every group shows with its letter and shape', () => {
    renderWithProviders(<GuideIndex workshopId={workshopId} />);
    for (const g of DEFECT_GROUPS) {
      expect(screen.getByRole('heading', { level: 2, name: new RegExp(`${g.name}.*letter ${g.code}, ${g.shape}`) })).toBeInTheDocument();
    }
  });

  test('when someone searches "bubbles" and presses Enter, then they land on gas porosity', async () => {
    const { user, router } = renderWithProviders(<GuideIndex workshopId={workshopId} />);

    await user.type(screen.getByRole('searchbox', { name: 'Search the defect guide' }), 'bubbles');
    const results = screen.getAllByRole('link').filter((l) => l.getAttribute('href')?.includes('/guide/'));
    expect(results[0]).toHaveAccessibleName(/Gas porosity/);
    await user.keyboard('{Enter}');

    expect(router.state.location.pathname).toBe(`/w/${workshopId}/guide/gas_porosity`);
  });
});

describe('DefectKindGuide', () => {
  test('when gas porosity opens, then it shows the gas-or-shrinkage aid, causes by variable with fixes and sources, and the photos', async () => {
    const api = stubApi({ [`GET /api/workshops/${workshopId}/photos`]: { items: [photo()], nextCursor: null } });
    const kind = findDefectKind('gas_porosity')!;

    renderWithProviders(<DefectKindGuide workshopId={workshopId} kind={kind} temperatureUnit="F" />);

    expect(screen.getByRole('heading', { level: 1, name: kind.name })).toBeInTheDocument();
    expect(screen.getByText(kind.recognise)).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Gas or shrinkage?' })).toBeInTheDocument();
    const causes = screen.getByRole('region', { name: 'Likely causes, by melt variable' });
    expect(within(causes).getByRole('heading', { level: 3, name: 'Degassing' })).toBeInTheDocument();
    const undegassed = DEFAULT_RULES.find((r) => r.id === 'undegassed-gas')!;
    expect(within(causes).getByText(undegassed.fixes[0])).toBeInTheDocument();
    expect(within(causes).getByText(`Source: ${undegassed.source}`)).toBeInTheDocument();
    expect(within(causes).getByText(/dew point above 59 °F/)).toBeInTheDocument();

    const link = await screen.findByRole('link', { name: 'Ingot top, Thursday' });
    expect(link).toHaveAttribute('href', `/w/${workshopId}/photos/00000000-0000-4000-8000-0000000000d1`);
    const img = link.querySelector('img')!;
    expect(img).toHaveAttribute('src', '/api/p/00000000-0000-4000-8000-0000000000d1/thumb');
    expect(img).toHaveAttribute('width', '400');
    expect(screen.getByRole('link', { name: /Gallery: every photo marked gas porosity/ })).toHaveAttribute(
      'href',
      `/w/${workshopId}/gallery?kind=gas_porosity`,
    );
    expect(api.requests[0]).toMatchObject({ method: 'GET', path: `/api/workshops/${workshopId}/photos` });
  });

  test('when a cold shut with no photos opens, then there is no gas aid and the empty photos say what to do', async () => {
    stubApi({ [`GET /api/workshops/${workshopId}/photos`]: { items: [], nextCursor: null } });

    renderWithProviders(<DefectKindGuide workshopId={workshopId} kind={findDefectKind('cold_shut')!} temperatureUnit="C" />);

    expect(screen.queryByRole('heading', { name: 'Gas or shrinkage?' })).not.toBeInTheDocument();
    expect(await screen.findByText('No photo is marked cold shut yet')).toBeInTheDocument();
  });
});
