import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { findAlloy, formatTemperatureDifference, fToC, superheatC } from '#shared/domain/index.ts';
import type { HeatCreateInput } from '#shared/heats/heat-schemas.ts';
import type { CurrentUser } from '#shared/auth/auth-schemas.ts';
import { json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser, buildWorkshop, testId } from '#src/testing/data.ts';
import { buildCrucible, buildDefaults, buildFurnace, buildMould, heatDetailFrom } from '#src/testing/heat-data.ts';
import { renderApp } from '#src/testing/render.tsx';

// The heat form through its real route (/w/:id/heats/new): defaults, live
// figures and the request it sends, against stubbed API answers.

const PAGE_WAIT = { timeout: 5000 };

function setup({ user: userOverrides = {}, defaults = buildDefaults() }: { user?: Partial<CurrentUser>; defaults?: ReturnType<typeof buildDefaults> } = {}) {
  const workshop = buildWorkshop({ role: 'caster' });
  const me = buildUser({ memberships: [{ workshopId: workshop.id, workshopName: workshop.name, role: 'caster' }], ...userOverrides });
  const base = `/api/workshops/${workshop.id}`;
  const heatId = testId();
  const furnace = buildFurnace({ name: 'Devil forge' });
  const crucible = buildCrucible({ name: 'A6 clay-graphite' });
  const mould = buildMould({ name: 'Ingot tray' });
  let created: ReturnType<typeof heatDetailFrom> | null = null;
  const api = stubApi({
    'GET /api/auth/me': buildSession(me, 'csrf-heat'),
    'GET /api/workshops': [workshop],
    [`GET ${base}/heats/last-defaults`]: defaults,
    [`GET ${base}/furnaces`]: [furnace],
    [`GET ${base}/crucibles`]: [crucible],
    [`GET ${base}/moulds`]: [mould],
    [`GET ${base}/members`]: [],
    [`GET ${base}/furnaces/${furnace.id}/setpoint`]: ({ query }) =>
      json({ furnaceId: furnace.id, targetC: Number(query.get('targetC')), setpointC: Number(query.get('targetC')) + 15, offsetC: -15, spreadC: 3, samples: 4, basis: 'history' }),
    [`GET ${base}/moulds/${mould.id}/charge-plan`]: {
      mouldId: mould.id,
      casterId: me.id,
      alloy: 'A356.0',
      castingG: 450,
      expectedYieldPct: 50,
      marginPct: 10,
      chargeG: 990,
      basis: 'default',
      samples: 0,
    },
    [`POST ${base}/heats`]: ({ body }) => {
      created = heatDetailFrom(body as HeatCreateInput, { id: heatId, workshopId: workshop.id, casterId: me.id });
      return json(created, { status: 201 });
    },
    [`GET ${base}/heats/${heatId}`]: () => json(created),
  });
  const view = renderApp(`/w/${workshop.id}/heats/new`);
  return { ...view, api, base, workshop, furnace, crucible, mould, heatId };
}

async function fillTheEssentials(user: ReturnType<typeof setup>['user'], { pour }: { pour: string }) {
  await user.selectOptions(screen.getByLabelText('Alloy'), 'A356.0');
  await user.type(screen.getAllByLabelText('Mass')[0]!, '1000');
  await user.type(screen.getByLabelText('Pour temperature'), pour);
  await user.click(screen.getByRole('button', { name: 'Poured' }));
  for (const check of ['Tools dry', 'Protective equipment on', 'Floor clear']) await user.click(screen.getByLabelText(check));
}

// Each test drives the whole form through the lazy route, which takes a few seconds cold.
describe('HeatForm', { timeout: 20_000 }, () => {
  test('when a °F user logs a pour temperature, then the API receives it in °C', async () => {
    // Arrange
    const { user, api, base, router, heatId, workshop } = setup({ user: { temperatureUnit: 'F' } });
    await screen.findByRole('heading', { level: 1, name: 'Log a heat' }, PAGE_WAIT);
    await screen.findByLabelText('Alloy', {}, PAGE_WAIT);
    expect(screen.getByLabelText('Pour temperature').closest('div')).toHaveTextContent('°F');

    // Act
    await fillTheEssentials(user, { pour: '1330' });
    await user.click(screen.getByRole('button', { name: 'Save the heat' }));

    // Assert
    await expect.poll(() => api.to('POST', `${base}/heats`).length).toBe(1);
    const body = api.to('POST', `${base}/heats`)[0]!.body as HeatCreateInput;
    expect(body.pourTempC).toBeCloseTo(fToC(1330), 9);
    expect(body.alloy).toBe('A356.0');
    expect(body.chargeLines).toEqual([{ kind: 'ingot', description: null, massG: 1000 }]);
    expect(body.safety).toEqual({ dryTools: true, ppe: true, clearFloor: true });
    await expect.poll(() => router.state.location.pathname).toBe(`/w/${workshop.id}/heats/${heatId}`);
  });

  test('when the alloy and pour temperature are in, then the superheat beside them is the trade core’s', async () => {
    const { user } = setup();
    await screen.findByLabelText('Alloy', {}, PAGE_WAIT);

    await user.selectOptions(screen.getByLabelText('Alloy'), 'A356.0');
    await user.type(screen.getByLabelText('Pour temperature'), '720');

    const expected = formatTemperatureDifference(superheatC(720, findAlloy('A356.0')!), 'C');
    const figures = screen.getByLabelText('Pour figures');
    expect(within(figures).getByText(expected)).toBeInTheDocument();
    expect(within(figures).getByText(/above the liquidus of A356\.0, 615 °C/)).toBeInTheDocument();
  });

  test('when the caster has a last heat, then the new form starts from its choices, in their units', async () => {
    const furnaceId = testId();
    const defaults = buildDefaults({ basedOnHeatId: testId(), alloy: '319.0', setpointC: 740, fluxKind: 'cover', fluxAmountG: 5, degassing: 'tablet' });
    setup({ user: { temperatureUnit: 'F' }, defaults: { ...defaults, furnaceId } });
    await screen.findByLabelText('Alloy', {}, PAGE_WAIT);

    expect(screen.getByText('Started from your last heat')).toBeInTheDocument();
    expect(screen.getByLabelText('Alloy')).toHaveValue('319.0');
    expect(screen.getByLabelText('Furnace setpoint')).toHaveValue('1364');
    expect(screen.getByLabelText('Flux')).toHaveValue('cover');
    expect(screen.getByLabelText('Flux used')).toHaveValue('5');
    expect(screen.getByLabelText('Degassing')).toHaveValue('tablet');
  });

  test('when a charge line is added and another removed, then only the lines kept are sent', async () => {
    const { user, api, base } = setup();
    await screen.findByLabelText('Alloy', {}, PAGE_WAIT);

    await user.click(screen.getByRole('button', { name: 'Add a charge line' }));
    await user.click(screen.getByRole('button', { name: 'Add a charge line' }));
    expect(screen.getAllByRole('group', { name: /^Charge line \d$/ })).toHaveLength(3);
    const [, second, third] = screen.getAllByLabelText('Mass');
    await user.selectOptions(screen.getAllByLabelText('Kind')[1]!, 'clean_scrap');
    await user.type(second!, '350');
    await user.type(third!, '99');
    await user.click(screen.getByRole('button', { name: 'Remove charge line 3' }));
    expect(screen.getAllByRole('group', { name: /^Charge line \d$/ })).toHaveLength(2);

    await fillTheEssentials(user, { pour: '720' });
    expect(within(screen.getByLabelText('Charge figures')).getByText('1350 g')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save the heat' }));

    await expect.poll(() => api.to('POST', `${base}/heats`).length).toBe(1);
    const body = api.to('POST', `${base}/heats`)[0]!.body as HeatCreateInput;
    expect(body.chargeLines).toEqual([
      { kind: 'ingot', description: null, massG: 1000 },
      { kind: 'clean_scrap', description: null, massG: 350 },
    ]);
  });

  test('when a mass is not a number, then it is marked and nothing is sent', async () => {
    const { user, api, base } = setup();
    await screen.findByLabelText('Alloy', {}, PAGE_WAIT);

    await fillTheEssentials(user, { pour: '720' });
    await user.clear(screen.getAllByLabelText('Mass')[0]!);
    await user.type(screen.getAllByLabelText('Mass')[0]!, 'lots');
    await user.click(screen.getByRole('button', { name: 'Save the heat' }));

    expect(await screen.findByText('Enter a number, like 720 or 720.5')).toBeInTheDocument();
    expect(screen.getByRole('alert')).toHaveTextContent('Not saved yet');
    expect(api.to('POST', `${base}/heats`)).toHaveLength(0);
  });
});
