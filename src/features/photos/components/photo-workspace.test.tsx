import { screen, within } from '@testing-library/react';
import { Suspense } from 'react';
import { describe, expect, test } from 'vitest';
import type { Role } from '#shared/auth/roles.ts';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { buildSession, buildUser } from '#src/testing/data.ts';
import { json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildMark, buildPhoto } from '#src/testing/photo-data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { PhotoWorkspace } from './photo-workspace.tsx';

const workshopId = '00000000-0000-4000-8000-0000000000aa';
const me = '00000000-0000-4000-8000-0000000000d1';
const someoneElse = '00000000-0000-4000-8000-0000000000d2';

function setup(role: Role = 'student') {
  const photo = buildPhoto({
    workshopId,
    title: 'Lid casting',
    marks: [
      buildMark({ kind: 'gas_porosity', authorId: me, createdAt: '2026-11-28T19:00:00.000Z' }),
      buildMark({ kind: 'cold_shut', authorId: someoneElse, authorName: 'Lena Okafor', shape: 'box', x: 0.1, y: 0.1, width: 0.2, height: 0.2, createdAt: '2026-11-28T19:10:00.000Z' }),
    ],
  });
  const detailPath = `/api/workshops/${workshopId}/photos/${photo.id}`;
  let current = photo;
  const api = stubApi({
    [`GET ${detailPath}`]: () => json(current),
    [`DELETE ${detailPath}/marks/${photo.marks[0].id}`]: () => {
      current = { ...current, marks: current.marks.slice(1) };
      return new Response(null, { status: 204 });
    },
    [`POST ${detailPath}/marks`]: ({ body }) => {
      const mark = buildMark({ ...(body as object), photoId: photo.id, authorId: me, createdAt: '2026-11-28T20:00:00.000Z' });
      current = { ...current, marks: [...current.marks, mark] };
      return json(mark, { status: 201 });
    },
  });
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(buildUser({ id: me }), 'csrf-marks'));
  const view = renderWithProviders(
    <Suspense fallback={<p>Loading</p>}>
      <PhotoWorkspace workshopId={workshopId} photoId={photo.id} actor={{ id: me, role }} />
    </Suspense>,
    { queryClient },
  );
  return { ...view, api, photo, detailPath };
}

describe('PhotoWorkspace', () => {
  test('when ] and [ are pressed, then the selection steps through the marks and the row shows it', async () => {
    const { user } = setup();
    const list = await screen.findByRole('list', { name: 'Marks on this photo' });

    await user.keyboard(']');
    expect(within(list).getByRole('button', { name: /Mark 1/ })).toHaveAttribute('aria-current', 'true');
    await user.keyboard(']');
    expect(within(list).getByRole('button', { name: /Mark 2/ })).toHaveAttribute('aria-current', 'true');
    await user.keyboard('[[');
    expect(within(list).getByRole('button', { name: /Mark 1/ })).toHaveAttribute('aria-current', 'true');
    expect(document.querySelector('[data-selected]')?.getAttribute('data-mark-id')).toBeTruthy();
  });

  test('when a student looks at the marks, then only their own mark can be changed or deleted', async () => {
    setup('student');
    const list = await screen.findByRole('list', { name: 'Marks on this photo' });
    expect(within(list).getByRole('button', { name: 'Delete mark 1' })).toBeInTheDocument();
    expect(within(list).queryByRole('button', { name: 'Delete mark 2' })).not.toBeInTheDocument();
    expect(within(list).getByText(/marked by you/)).toBeInTheDocument();
    expect(within(list).getByText(/marked by Lena Okafor/)).toBeInTheDocument();
  });

  test('when a mentor looks at the marks, then they can change anyone’s', async () => {
    setup('mentor');
    const list = await screen.findByRole('list', { name: 'Marks on this photo' });
    expect(within(list).getByRole('button', { name: 'Change mark 2' })).toBeInTheDocument();
  });

  test('when Delete is pressed on the selected mark and confirmed, then it is deleted', async () => {
    const { user, api, detailPath, photo } = setup();
    await screen.findByRole('list', { name: 'Marks on this photo' });

    await user.keyboard(']');
    await user.keyboard('{Delete}');
    const confirm = await screen.findByRole('dialog', { name: 'Delete mark 1?' });
    expect(within(confirm).getByRole('button', { name: 'Keep it' })).toHaveFocus();
    await user.click(within(confirm).getByRole('button', { name: 'Delete mark' }));

    await expect.poll(() => api.to('DELETE', `${detailPath}/marks/${photo.marks[0].id}`).length).toBe(1);
    await expect.poll(() => within(screen.getByRole('list', { name: 'Marks on this photo' })).getAllByRole('listitem').length).toBe(1);
  });

  test('when "m" is pressed and Enter marks at the cross, then the picker opens and the saved mark is a point there', async () => {
    const { user, api, detailPath } = setup();
    await screen.findByRole('list', { name: 'Marks on this photo' });

    await user.keyboard('m');
    const surface = await screen.findByRole('application');
    await expect.poll(() => document.activeElement).toBe(surface);
    await user.keyboard('{ArrowRight}{ArrowRight}{ArrowDown}{Enter}');
    const picker = await screen.findByRole('dialog', { name: 'Mark a defect' });
    await user.type(within(picker).getByRole('searchbox', { name: 'Find the defect' }), 'pinholes{Enter}');
    await user.click(within(picker).getByRole('button', { name: 'Save mark' }));

    await expect.poll(() => api.to('POST', `${detailPath}/marks`).length).toBe(1);
    const sent = api.to('POST', `${detailPath}/marks`)[0].body as { kind: string; shape: string; x: number; y: number };
    expect(sent.kind).toBe('pinholes');
    expect(sent.shape).toBe('point');
    expect(sent.x).toBeCloseTo(0.54);
    expect(sent.y).toBeCloseTo(0.52);
    expect(api.to('POST', `${detailPath}/marks`)[0].headers.get('x-csrf-token')).toBe('csrf-marks');
  });

  test('when Esc is pressed while marking, then marking stops', async () => {
    const { user } = setup();
    await screen.findByRole('list', { name: 'Marks on this photo' });
    await user.click(screen.getByRole('button', { name: 'Mark a defect' }));
    expect(await screen.findByRole('application')).toBeInTheDocument();
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('application')).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Mark a defect' })).toHaveAttribute('aria-pressed', 'false');
  });
});
