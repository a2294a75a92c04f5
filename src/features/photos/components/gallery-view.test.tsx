import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { json, stubApi, type StubbedRequest } from '#src/testing/fetch-stub.ts';
import { buildIndexItem, buildMark, buildPhoto } from '#src/testing/photo-data.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { GalleryView } from './gallery-view.tsx';

const workshopId = '00000000-0000-4000-8000-0000000000aa';
const base = `/api/workshops/${workshopId}`;
const ray = { id: '00000000-0000-4000-8000-0000000000c1', name: 'Ray Dunmore' };
const lena = { id: '00000000-0000-4000-8000-0000000000c2', name: 'Lena Okafor' };

function setup(path: string, routes: Parameters<typeof stubApi>[0] = {}) {
  const photos = [
    buildPhoto({ workshopId, title: 'Top of the bar ingot', marks: [buildMark({ kind: 'gas_porosity' }), buildMark({ kind: 'cold_shut' })] }),
    buildPhoto({ workshopId, title: 'Bracket, sprue side' }),
  ];
  const api = stubApi({
    [`GET ${base}/photos`]: { items: photos, nextCursor: null },
    // Each photo's detail (with its marks) is fetched as the lightbox reaches it.
    ...Object.fromEntries(photos.map((p) => [`GET ${base}/photos/${p.id}`, p])),
    [`GET ${base}/photo-index`]: {
      items: [
        buildIndexItem({ id: photos[0].id, title: 'Top of the bar ingot', kinds: ['gas_porosity', 'cold_shut'], casterName: ray.name }),
        buildIndexItem({ id: photos[1].id, title: 'Bracket, sprue side', kinds: ['hot_tear'], casterName: lena.name }),
      ],
    },
    ...routes,
  });
  const view = renderWithProviders(<GalleryView workshopId={workshopId} casters={[lena, ray]} />, { path });
  const lists = () => api.to('GET', `${base}/photos`);
  const lastQuery = () => Object.fromEntries((lists().at(-1) as StubbedRequest).query);
  return { ...view, api, photos, lists, lastQuery };
}

describe('GalleryView', () => {
  test('when a shared link carries filters, then the list is asked for with them and the controls show them', async () => {
    const { lastQuery } = setup(`/w/${workshopId}/gallery?kind=gas_porosity&alloy=A356.0&mouldMaterial=graphite&from=2026-11-01`);

    expect(await screen.findByRole('link', { name: 'Top of the bar ingot' })).toBeInTheDocument();
    expect(lastQuery()).toEqual({ kind: 'gas_porosity', alloy: 'A356.0', mouldMaterial: 'graphite', from: '2026-11-01', limit: '40' });
    expect(screen.getByRole('combobox', { name: 'Defect' })).toHaveValue('gas_porosity');
    expect(screen.getByRole('combobox', { name: 'Alloy' })).toHaveValue('A356.0');
    expect(screen.getByLabelText('Added from')).toHaveValue('2026-11-01');
  });

  test('when a filter is chosen, then it goes into the URL and the list is asked for again; Clear takes every filter out', async () => {
    const { user, router, lastQuery } = setup(`/w/${workshopId}/gallery`);
    await screen.findByRole('link', { name: 'Top of the bar ingot' });

    await user.selectOptions(screen.getByRole('combobox', { name: 'Caster' }), 'Lena Okafor');

    expect(new URLSearchParams(router.state.location.search).get('casterId')).toBe(lena.id);
    await expect.poll(() => lastQuery().casterId).toBe(lena.id);

    await user.click(screen.getByRole('button', { name: 'Clear search and filters' }));
    expect(router.state.location.search).toBe('');
    await expect.poll(() => lastQuery().casterId).toBeUndefined();
  });

  test('when a misspelt search is typed, then the URL keeps it and the index (fetched once) gives the matches, filters applied', async () => {
    const { user, router, api } = setup(`/w/${workshopId}/gallery`);
    await screen.findByRole('link', { name: 'Top of the bar ingot' });

    await user.type(screen.getByRole('searchbox', { name: 'Search the photos' }), 'gass porosty');

    const results = await screen.findByRole('list', { name: 'Search results' });
    expect(within(results).getByRole('link', { name: 'Top of the bar ingot' })).toBeInTheDocument();
    expect(within(results).queryByRole('link', { name: 'Bracket, sprue side' })).not.toBeInTheDocument();
    expect(new URLSearchParams(router.state.location.search).get('q')).toBe('gass porosty');
    expect(api.to('GET', `${base}/photo-index`)).toHaveLength(1);

    await user.selectOptions(screen.getByRole('combobox', { name: 'Caster' }), 'Lena Okafor');
    expect(await screen.findByText('No photos match “gass porosty”')).toBeInTheDocument();
  });

  test('when the workshop has no photos yet, then the page says how to get them in', async () => {
    setup(`/w/${workshopId}/gallery`, { [`GET ${base}/photos`]: () => json({ items: [], nextCursor: null }) });

    expect(await screen.findByRole('heading', { name: 'No photos yet' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'heat log' })).toHaveAttribute('href', `/w/${workshopId}/heats`);
    expect(screen.getByText(/choose one of its castings and add photos there/)).toBeInTheDocument();
  });

  test('when there are more photos than one page, then "Load more" asks for the next page with the cursor', async () => {
    const first = buildPhoto({ workshopId, title: 'First page photo' });
    const second = buildPhoto({ workshopId, title: 'Second page photo' });
    const { user, lastQuery } = setup(`/w/${workshopId}/gallery`, {
      [`GET ${base}/photos`]: ({ query }) =>
        json(query.get('cursor') === 'next-1' ? { items: [second], nextCursor: null } : { items: [first], nextCursor: 'next-1' }),
    });
    await screen.findByRole('link', { name: 'First page photo' });

    await user.click(screen.getByRole('button', { name: 'Load more photos' }));

    expect(await screen.findByRole('link', { name: 'Second page photo' })).toBeInTheDocument();
    expect(lastQuery().cursor).toBe('next-1');
    expect(screen.queryByRole('button', { name: 'Load more photos' })).not.toBeInTheDocument();
  });

  test('when a thumbnail is opened, then the lightbox shows it and → steps to the next result', async () => {
    const { user, photos } = setup(`/w/${workshopId}/gallery`);
    await screen.findByRole('link', { name: 'Top of the bar ingot' });

    await user.click(screen.getByRole('button', { name: 'Look at Top of the bar ingot larger' }));
    const dialog = await screen.findByRole('dialog', { name: /Top of the bar ingot/ });
    expect(within(dialog).getByText(/1 of 2/)).toBeInTheDocument();
    expect(await within(dialog).findByRole('list', { name: 'Marks' })).toHaveTextContent('Gas porosity');

    await user.keyboard('{ArrowRight}');
    expect(await screen.findByRole('dialog', { name: /Bracket, sprue side/ })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Open the photo page' })).toHaveAttribute('href', `/w/${workshopId}/photos/${photos[1].id}`);
  });
});
