import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import type { Comment } from '#shared/reports/comment-schemas.ts';
import type { ReportDetail } from '#shared/reports/report-schemas.ts';
import { testId } from '#src/testing/data.ts';
import { stubApi } from '#src/testing/fetch-stub.ts';
import { buildMark, buildPhoto } from '#src/testing/photo-data.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { ReportView } from './report-view.tsx';

const workshopId = testId();
const me = testId();

function setUp() {
  const photo = buildPhoto({ workshopId });
  const mark = buildMark({ photoId: photo.id, kind: 'gas_porosity' });
  photo.marks = [mark];
  const report: ReportDetail = {
    id: testId(),
    workshopId,
    castingId: photo.castingId,
    heatId: photo.heatId,
    authorId: testId(),
    authorName: 'Jonah',
    title: 'Pinholes on top',
    question: 'Why the pinholes?',
    state: 'in_review',
    requestedMentorId: null,
    mentorIds: [me],
    photoIds: [photo.id],
    resolutionNote: null,
    confirmedCauses: [],
    followUp: null,
    events: [],
    allowedActions: ['resolve'],
    canEdit: false,
    snapshot: null,
    current: { input: { alloy: null, defects: [], conditions: {} }, causes: [], cautions: [], priorsNote: null, missing: [], ruleSet: { hash: 'h', custom: false } },
    changed: false,
    createdAt: '2026-11-30T10:00:00.000Z',
    updatedAt: '2026-11-30T10:00:00.000Z',
    submittedAt: '2026-11-30T10:00:00.000Z',
    resolvedAt: null,
  };
  const comment: Comment = {
    id: testId(),
    reportId: report.id,
    parentId: null,
    authorId: me,
    authorName: 'Priya',
    body: 'Look **here**',
    html: '<p>Look <strong>here</strong></p>',
    markId: mark.id,
    photoId: photo.id,
    mentions: [],
    createdAt: '2026-11-30T11:00:00.000Z',
    editedAt: null,
    editableUntil: '2026-11-30T11:15:00.000Z',
  };
  stubApi({
    [`GET /api/workshops/${workshopId}/reports/${report.id}`]: report,
    [`GET /api/workshops/${workshopId}/photos/${photo.id}`]: photo,
    [`GET /api/workshops/${workshopId}/reports/${report.id}/comments`]: { items: [comment] },
  });
  return { report, mark };
}

describe('ReportView', () => {
  test('when an anchored comment is opened, then its mark is highlighted on the photo', async () => {
    // Arrange
    const { report, mark } = setUp();
    const { user } = renderWithProviders(
      <ReportView workshopId={workshopId} reportId={report.id} currentUserId={me} members={[]} renderDiagnosis={() => null} />,
    );
    const comment = await screen.findByTestId('comment');
    expect(within(comment).getByText('here').tagName).toBe('STRONG');
    const markShape = () => document.querySelector(`[data-mark-id="${mark.id}"]`);
    await screen.findByRole('img', { name: 'Photo 1' });
    expect(markShape()).not.toHaveAttribute('data-highlighted');

    // Act
    await user.click(within(comment).getByRole('button', { name: /On Mark 1 · gas porosity/ }));

    // Assert
    expect(markShape()).toHaveAttribute('data-highlighted', 'true');
    expect(screen.getByRole('status')).toHaveTextContent('Showing Mark 1 · gas porosity');
    expect(within(comment).getByRole('button', { name: /On Mark 1/ })).toHaveAttribute('aria-pressed', 'true');
  });

  test('when the viewer is a reviewer of a report in review, then only the resolve action shows', async () => {
    // Arrange
    const { report } = setUp();

    // Act
    renderWithProviders(<ReportView workshopId={workshopId} reportId={report.id} currentUserId={me} members={[]} renderDiagnosis={() => null} />);

    // Assert
    const actions = await screen.findByTestId('report-actions');
    expect(within(actions).getAllByRole('button').map((b) => b.textContent)).toEqual(['Resolve with confirmed causes']);
  });
});
