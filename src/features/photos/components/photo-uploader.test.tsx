import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, test } from 'vitest';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { buildSession, buildUser } from '#src/testing/data.ts';
import { buildUploadResult } from '#src/testing/photo-data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { stubXhr } from '#src/testing/xhr-stub.ts';
import { PhotoUploader } from './photo-uploader.tsx';

const workshopId = '00000000-0000-4000-8000-0000000000aa';
const castingId = '00000000-0000-4000-8000-0000000000bb';

function photoFile(name: string, bytes = 1000, type = 'image/jpeg') {
  return new File([new Uint8Array(bytes)], name, { type });
}

function setup() {
  const xhr = stubXhr();
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(buildUser(), 'csrf-upload'));
  const view = renderWithProviders(<PhotoUploader workshopId={workshopId} castingId={castingId} />, { queryClient });
  const input = screen.getByLabelText('Photos to add') as HTMLInputElement;
  const rowOf = (name: string) => screen.getByTitle(name).closest('li') as HTMLElement;
  return { ...view, xhr, input, rowOf };
}

describe('PhotoUploader', () => {
  test('when two photos are chosen, then each goes in its own request with the CSRF token and its own progress bar', async () => {
    const { user, xhr, input, rowOf } = setup();

    await user.upload(input, [photoFile('top.jpg', 2000), photoFile('side.heic', 3000, '')]);

    await expect.poll(() => xhr.sent.length).toBe(2);
    expect(xhr.sent.map((r) => r.fileName)).toEqual(['top.jpg', 'side.heic']);
    expect(xhr.sent[0].url).toBe(`/api/workshops/${workshopId}/castings/${castingId}/photos`);
    expect(xhr.sent[0].headers['x-csrf-token']).toBe('csrf-upload');

    xhr.named('top.jpg')[0].progress(500, 2000);
    const bar = within(rowOf('top.jpg')).getByRole('progressbar', { name: 'top.jpg upload' });
    expect(bar).toHaveAttribute('aria-valuenow', '25');
    expect(within(rowOf('side.heic')).getByRole('progressbar')).toHaveAttribute('aria-valuenow', '0');

    xhr.named('top.jpg')[0].progress(2000, 2000);
    expect(within(rowOf('top.jpg')).getByText('Storing')).toBeInTheDocument();
    await xhr.named('top.jpg')[0].respond(201, { results: [buildUploadResult('top.jpg')] });
    expect(within(rowOf('top.jpg')).getByText('Added')).toBeInTheDocument();
    expect(within(rowOf('top.jpg')).getByRole('link', { name: 'Open it to mark defects' })).toBeInTheDocument();
  });

  test('when a photo is cancelled while sending, then its request is aborted and Retry sends it again', async () => {
    const { user, xhr, input, rowOf } = setup();
    await user.upload(input, [photoFile('pour.jpg')]);
    await expect.poll(() => xhr.sent.length).toBe(1);
    xhr.sent[0].progress(300, 1000);

    await user.click(within(rowOf('pour.jpg')).getByRole('button', { name: 'Cancel pour.jpg' }));

    expect(xhr.sent[0].aborted).toBe(true);
    expect(within(rowOf('pour.jpg')).getByText('Cancelled')).toBeInTheDocument();
    expect(within(rowOf('pour.jpg')).queryByRole('progressbar')).not.toBeInTheDocument();

    await user.click(within(rowOf('pour.jpg')).getByRole('button', { name: 'Retry pour.jpg' }));
    await expect.poll(() => xhr.sent.length).toBe(2);
    await xhr.sent[1].respond(201, { results: [buildUploadResult('pour.jpg')] });
    expect(within(rowOf('pour.jpg')).getByText('Added')).toBeInTheDocument();
  });

  test('when the server refuses one file, then that row says why in our words and the other still goes in', async () => {
    const { user, xhr, input, rowOf } = setup();
    await user.upload(input, [photoFile('scan.jpg'), photoFile('good.jpg')]);
    await expect.poll(() => xhr.sent.length).toBe(2);

    await xhr.named('scan.jpg')[0].respond(415, {
      error: { code: 'image-unsupported-type', message: 'scan.jpg: TIFF files are not accepted; send a JPEG, PNG, WebP or HEIC photo' },
    });
    await xhr.named('good.jpg')[0].respond(201, { results: [buildUploadResult('good.jpg')] });

    const failed = within(rowOf('scan.jpg'));
    expect(failed.getByText(/Not a photo we can read/)).toBeInTheDocument();
    expect(failed.getByText('Send a JPEG, PNG, WebP or HEIC photo.')).toBeInTheDocument();
    // Sending the same file again cannot help, so there is no Retry.
    expect(failed.queryByRole('button', { name: /Retry/ })).not.toBeInTheDocument();
    expect(within(rowOf('good.jpg')).getByText('Added')).toBeInTheDocument();
  });

  test('when the photo store is away, then the row says when to try again and Retry works', async () => {
    const { user, xhr, input, rowOf } = setup();
    await user.upload(input, [photoFile('late.jpg')]);
    await expect.poll(() => xhr.sent.length).toBe(1);

    await xhr.sent[0].respond(503, { error: { code: 'storage-unavailable', message: 'late.jpg: not reachable' } }, { 'Retry-After': '10' });

    expect(within(rowOf('late.jpg')).getByText(/Nothing was saved. Try again in 10 seconds./)).toBeInTheDocument();
    await user.click(within(rowOf('late.jpg')).getByRole('button', { name: 'Retry late.jpg' }));
    await expect.poll(() => xhr.sent.length).toBe(2);
  });

  test('when the photo is already in the workshop, then the row says so and links to it', async () => {
    const { user, xhr, input, rowOf } = setup();
    await user.upload(input, [photoFile('again.jpg')]);
    await expect.poll(() => xhr.sent.length).toBe(1);
    const result = buildUploadResult('again.jpg', { status: 'duplicate' });

    await xhr.sent[0].respond(200, { results: [result] });

    const row = within(rowOf('again.jpg'));
    expect(row.getByText('Already in the gallery')).toBeInTheDocument();
    expect(row.getByRole('link', { name: 'Open the one in the gallery' })).toHaveAttribute('href', `/w/${workshopId}/photos/${result.photo.id}`);
  });

  test('when a file is not a photo, then it is listed as not added and never sent', async () => {
    const { xhr, input, rowOf } = setup();
    // A file picker filters by the accept list; a drop does not, so let this one through.
    await userEvent.setup({ applyAccept: false }).upload(input, [new File(['a,b'], 'heats.csv', { type: 'text/csv' })]);

    expect(await screen.findByTitle('heats.csv')).toBeInTheDocument();
    expect(within(rowOf('heats.csv')).getByText(/Not a photo/)).toBeInTheDocument();
    expect(xhr.sent).toHaveLength(0);
  });
});
