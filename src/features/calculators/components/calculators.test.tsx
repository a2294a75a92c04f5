import { queryOptions } from '@tanstack/react-query';
import { screen, within } from '@testing-library/react';
import { beforeEach, describe, expect, test, vi } from 'vitest';
import type { AlloyEntry } from '#shared/alloys/alloy-schemas.ts';
import {
  ALLOYS,
  chargeFor,
  cylinderRiserDiameterCm,
  dewPointC,
  findAlloy,
  formatMass,
  formatNumber,
  formatTemperature,
  formatTemperatureDifference,
  fToC,
  hydrogenSolubility,
  modulusCm,
  moldConstantFrom,
  ozToG,
  patternDimension,
  plateShape,
  pourYield,
  riserModulusRule,
  shrinkPctFromInchesPerFoot,
  suggestSetpoint,
  superheatC,
} from '#shared/domain/index.ts';
import type { Furnace, Mould } from '#shared/heats/equipment-schemas.ts';
import { cavityMassG } from '#shared/heats/heat-figures.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { numberToInput, type Units } from '#src/lib/unit-input.ts';
import { ChargeCalculator } from './charge-calculator.tsx';
import { DewPointCalculator } from './dew-point-calculator.tsx';
import { formatSolubility, HydrogenCalculator } from './hydrogen-calculator.tsx';
import { PatternShrinkCalculator } from './pattern-shrink-calculator.tsx';
import { SetpointCalculator } from './setpoint-calculator.tsx';
import { SolidificationCalculator } from './solidification-calculator.tsx';
import { SuperheatCalculator } from './superheat-calculator.tsx';
import { TemperatureConverter } from './temperature-converter.tsx';
import { YieldCalculator } from './yield-calculator.tsx';

const metric: Units = { temperatureUnit: 'C', massUnit: 'g' };
const imperial: Units = { temperatureUnit: 'F', massUnit: 'oz' };
const a356 = findAlloy('A356.0')!;

/** A computed figure by its label (each readout is an <output>, role status). */
const readout = (label: string) => screen.getByRole('status', { name: label });

const libraryEntries: AlloyEntry[] = ALLOYS.map((alloy) => ({
  origin: 'library',
  id: null,
  alloy,
  createdBy: null,
  createdByName: null,
  createdAt: null,
  updatedAt: null,
}));

describe('SuperheatCalculator', () => {
  test('when a pour of 1350 °F is entered for A356.0, then the superheat is superheatC of it, in °F with °C beside', async () => {
    const { user } = renderWithProviders(<SuperheatCalculator units={imperial} alloys={libraryEntries} />);

    expect(screen.getByRole('combobox', { name: 'Alloy' })).toHaveValue('A356.0');
    await user.type(screen.getByRole('textbox', { name: /Pour temperature/ }), '1350');

    const expected = superheatC(fToC(1350), a356);
    expect(readout('Superheat')).toHaveTextContent(formatTemperatureDifference(expected, 'F'));
    expect(screen.getByText(formatTemperatureDifference(expected, 'C'))).toBeInTheDocument();
    expect(screen.getByText(/Sand mould:/).parentElement).toHaveTextContent('within the range');
  });

  test('when a workshop alloy is picked and 640 °C entered, then its own liquidus counts and the pour is below its range', async () => {
    const own: AlloyEntry = {
      ...libraryEntries[0],
      origin: 'workshop',
      id: '00000000-0000-4000-8000-00000000a110',
      alloy: { ...a356, designation: 'Wheel scrap', commonName: 'Wheels, assumed A356.0', liquidusC: 612, basedOn: 'A356.0', source: 'wheels' },
    };
    const { user } = renderWithProviders(<SuperheatCalculator units={metric} alloys={[...libraryEntries, own]} />);

    await user.selectOptions(screen.getByRole('combobox', { name: 'Alloy' }), 'Wheel scrap');
    await user.type(screen.getByRole('textbox', { name: /Pour temperature/ }), '640');

    expect(readout('Superheat')).toHaveTextContent(formatTemperatureDifference(superheatC(640, { liquidusC: 612 }), 'C'));
    expect(screen.getByText(/Sand mould:/).parentElement).toHaveTextContent(`${formatTemperatureDifference(675 - 640, 'C')} below the range`);
    expect(screen.getByText(/Workshop's note on Wheel scrap: wheels/)).toBeInTheDocument();
  });
});

describe('ChargeCalculator', () => {
  const mould: Mould = {
    id: '00000000-0000-4000-8000-00000000b001',
    name: 'Bracket pattern',
    material: 'green_sand',
    capacityG: 450,
    capacityAlloy: 'A356.0',
    hasRiser: true,
    coating: null,
    notes: null,
    castingCount: 3,
    createdAt: '2026-11-01T10:00:00.000Z',
    updatedAt: '2026-11-01T10:00:00.000Z',
  };

  test('when a mould of 450 g of A356.0 is poured in C83600 at 50 % yield and 10 % margin, then it weighs out chargeFor of the rescaled cavity', async () => {
    const { user } = renderWithProviders(<ChargeCalculator units={metric} moulds={[mould]} equipmentHref="/equipment" />);

    await user.selectOptions(screen.getByRole('combobox', { name: /Alloy to pour/ }), 'C83600');

    const castingG = cavityMassG({ capacityG: 450, capacityAlloy: 'A356.0' }, 'C83600');
    expect(readout('Weigh out')).toHaveTextContent(formatMass(chargeFor({ castingG, expectedYieldPct: 50, marginPct: 10 }), 'g'));
  });

  test('when 16 oz is typed in at 75 % and no margin, then the charge is chargeFor of 16 oz, shown in oz with grams beside', async () => {
    const { user } = renderWithProviders(<ChargeCalculator units={imperial} moulds={[]} equipmentHref="/equipment" />);

    expect(screen.getByText('No mould with a recorded capacity yet')).toBeInTheDocument();
    await user.type(screen.getByRole('textbox', { name: /Casting mass/ }), '16');
    await user.clear(screen.getByRole('textbox', { name: /Expected yield/ }));
    await user.type(screen.getByRole('textbox', { name: /Expected yield/ }), '75');
    await user.clear(screen.getByRole('textbox', { name: /Margin/ }));
    await user.type(screen.getByRole('textbox', { name: /Margin/ }), '0');

    const grams = chargeFor({ castingG: ozToG(16), expectedYieldPct: 75, marginPct: 0 });
    expect(readout('Weigh out')).toHaveTextContent(formatMass(grams, 'oz'));
    expect(screen.getByText(formatMass(grams, 'g'))).toBeInTheDocument();
  });

  test('when the yield is above 100 %, then it says so in words instead of a figure', async () => {
    const { user } = renderWithProviders(<ChargeCalculator units={metric} moulds={[]} equipmentHref="/equipment" />);

    await user.type(screen.getByRole('textbox', { name: /Casting mass/ }), '450');
    await user.clear(screen.getByRole('textbox', { name: /Expected yield/ }));
    await user.type(screen.getByRole('textbox', { name: /Expected yield/ }), '120');

    expect(screen.getByText('The expected yield is outside the range this works for.')).toBeInTheDocument();
    expect(screen.queryByRole('status', { name: 'Weigh out' })).not.toBeInTheDocument();
  });
});

describe('YieldCalculator', () => {
  test('when 1000 g is poured into two castings of 300 g and 250 g, then the yield and returns are pourYield’s', async () => {
    const { user } = renderWithProviders(<YieldCalculator units={metric} />);

    await user.type(screen.getByRole('textbox', { name: /Metal poured/ }), '1000');
    await user.type(screen.getByRole('textbox', { name: 'Casting 1' }), '300');
    await user.click(screen.getByRole('button', { name: 'Add a casting' }));
    await user.type(screen.getByRole('textbox', { name: 'Casting 2' }), '250');

    const expected = pourYield({ chargeG: 1000, castingG: 550 });
    expect(readout('Casting yield')).toHaveTextContent(`${formatNumber(expected.yieldPct, 1)} %`);
    expect(readout('Returns (gates, risers, spill)')).toHaveTextContent(formatMass(expected.remainderG, 'g'));
  });

  test('when the castings outweigh the metal poured, then it says so', async () => {
    const { user } = renderWithProviders(<YieldCalculator units={metric} />);
    await user.type(screen.getByRole('textbox', { name: /Metal poured/ }), '100');
    await user.type(screen.getByRole('textbox', { name: 'Casting 1' }), '300');
    expect(screen.getByText('The castings cannot weigh more than the metal poured.')).toBeInTheDocument();
  });
});

describe('TemperatureConverter', () => {
  test('when 1350 °F is typed, then the °C field and the readout follow fToC', async () => {
    const { user } = renderWithProviders(<TemperatureConverter units={imperial} />);

    await user.type(screen.getByRole('textbox', { name: /Degrees Fahrenheit/ }), '1350');

    expect(screen.getByRole('textbox', { name: /Degrees Celsius/ })).toHaveValue(numberToInput(fToC(1350), 2));
    expect(readout('In °C')).toHaveTextContent(formatTemperature(fToC(1350), 'C', 1));
  });

  test('when 660 °C is typed, then °F shows 1220 °F (DOMAIN.md §4.5 test vector)', async () => {
    const { user } = renderWithProviders(<TemperatureConverter units={metric} />);
    await user.type(screen.getByRole('textbox', { name: /Degrees Celsius/ }), '660');
    expect(readout('In °F')).toHaveTextContent('1220.0 °F');
  });
});

describe('SetpointCalculator', () => {
  const furnace: Furnace = {
    id: '00000000-0000-4000-8000-00000000f001',
    name: 'Propane tower',
    kind: 'gas',
    notes: null,
    heatCount: 5,
    createdAt: '2026-11-01T10:00:00.000Z',
    updatedAt: '2026-11-01T10:00:00.000Z',
  };
  const history = [
    { setpointC: 740, measuredC: 722 },
    { setpointC: 750, measuredC: 735 },
    { setpointC: 730, measuredC: 716 },
  ];

  test('when a target of 1330 °F is entered, then the server is asked in °C and its setpoint shows in °F', async () => {
    const asked: number[] = [];
    const setpointQuery = (furnaceId: string, targetC: number) =>
      queryOptions({
        queryKey: ['test-setpoint', furnaceId, targetC] as const,
        queryFn: async () => {
          asked.push(targetC);
          return { furnaceId, targetC, ...suggestSetpoint({ targetC, history }) };
        },
      });
    const { user } = renderWithProviders(
      <SetpointCalculator units={imperial} furnaces={[furnace]} setpointQuery={setpointQuery} equipmentHref="/equipment" />,
    );

    await user.type(screen.getByRole('textbox', { name: /Target pour temperature/ }), '1330');

    const targetC = Math.round(fToC(1330) * 10) / 10;
    const advice = suggestSetpoint({ targetC, history });
    expect(await screen.findByRole('status', { name: 'Set the furnace to' })).toHaveTextContent(formatTemperature(advice.setpointC, 'F'));
    expect(asked.at(-1)).toBe(targetC);
    expect(screen.getByText(`${advice.samples} heats`)).toBeInTheDocument();
  });

  test('when the workshop has no furnace, then the page says what to do first', () => {
    renderWithProviders(
      <SetpointCalculator units={metric} furnaces={[]} setpointQuery={(furnaceId, targetC) =>
          queryOptions({ queryKey: ['unused', furnaceId, targetC], queryFn: async () => ({ furnaceId, targetC, ...suggestSetpoint({ targetC, history: [] }) }) })
        } equipmentHref="/equipment" />,
    );
    expect(screen.getByText('No furnace yet')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Equipment' })).toHaveAttribute('href', '/equipment');
  });
});

describe('DewPointCalculator', () => {
  test('when the air is 86 °F at 80 %, then the dew point is dewPointC of 30 °C and the band is labelled an app heuristic', async () => {
    const { user } = renderWithProviders(<DewPointCalculator units={imperial} />);

    await user.type(screen.getByRole('textbox', { name: /Air temperature/ }), '86');
    await user.type(screen.getByRole('textbox', { name: /Relative humidity/ }), '80');

    const dew = dewPointC({ tempC: fToC(86), relativeHumidityPct: 80 });
    expect(readout('Dew point')).toHaveTextContent(formatTemperature(dew, 'F', 1));
    expect(screen.getByText(formatTemperature(dew, 'C', 1))).toBeInTheDocument();
    expect(formatTemperature(dew, 'C', 1)).toBe('26.2 °C'); // DOMAIN.md §4.2: Td(30 °C, 80 %) = 26.17 °C
    expect(screen.getByText('Hydrogen pick-up risk: high')).toBeInTheDocument();
    expect(screen.getByText('App heuristic, not a published threshold')).toBeInTheDocument();
  });
});

describe('HydrogenCalculator', () => {
  // happy-dom lays nothing out; give the chart's container a size so the
  // chart draws as in a browser instead of warning about a 0 × 0 box.
  beforeEach(() => {
    vi.spyOn(HTMLElement.prototype, 'getBoundingClientRect').mockReturnValue(new DOMRect(0, 0, 640, 300));
    return () => vi.restoreAllMocks();
  });

  test('when 1292 °F is entered, then liquid and solid read hydrogenSolubility at 700 °C', async () => {
    const { user } = renderWithProviders(<HydrogenCalculator units={imperial} />);

    await user.type(screen.getByRole('textbox', { name: /Temperature/ }), '1292');

    expect(readout('Liquid aluminium can hold')).toHaveTextContent(formatSolubility(hydrogenSolubility({ tempC: 700, phase: 'liquid' })));
    expect(readout('Solid aluminium can hold')).toHaveTextContent(formatSolubility(hydrogenSolubility({ tempC: 700, phase: 'solid' })));
    expect(formatSolubility(hydrogenSolubility({ tempC: 700, phase: 'liquid' }))).toBe('0.912 mL/100 g'); // DOMAIN.md §4.1 vector
  });

  test('when the pressure is 0.01 atm, then the value is a tenth (Sieverts’ square root)', async () => {
    const { user } = renderWithProviders(<HydrogenCalculator units={metric} />);
    await user.type(screen.getByRole('textbox', { name: /Temperature/ }), '750');
    await user.clear(screen.getByRole('textbox', { name: /Hydrogen pressure/ }));
    await user.type(screen.getByRole('textbox', { name: /Hydrogen pressure/ }), '0.01');
    expect(readout('Liquid aluminium can hold')).toHaveTextContent(
      formatSolubility(hydrogenSolubility({ tempC: 750, phase: 'liquid', pressureAtm: 0.01 })),
    );
  });

  test('when the table view is chosen, then every 25 °C row is listed in the user’s unit', async () => {
    const { user } = renderWithProviders(<HydrogenCalculator units={imperial} />);
    expect(screen.getByRole('img', { name: /Line chart/ })).toBeInTheDocument();

    await user.click(screen.getByRole('radio', { name: 'Table' }));

    const table = screen.getByRole('table', { name: /Hydrogen solubility/ });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(1 + 11);
    expect(within(rows[1]).getByRole('rowheader')).toHaveTextContent(formatTemperature(600, 'F'));
    expect(rows[1]).toHaveTextContent(formatSolubility(hydrogenSolubility({ tempC: 600, phase: 'solid' })));
  });
});

describe('SolidificationCalculator', () => {
  test('when the GATE 2018 plate (80 × 120 × 20 mm) froze in 2 min, then modulus, time and riser follow the trade core', async () => {
    const { user } = renderWithProviders(<SolidificationCalculator units={metric} />);

    await user.type(screen.getByRole('textbox', { name: 'Length' }), '80');
    await user.type(screen.getByRole('textbox', { name: 'Width' }), '120');
    await user.type(screen.getByRole('textbox', { name: 'Thickness' }), '20');
    await user.click(screen.getByRole('radio', { name: 'Fit from a time' }));
    await user.type(screen.getByRole('textbox', { name: /Measured freezing time/ }), '2');

    const plate = plateShape({ lengthCm: 8, widthCm: 12, thicknessCm: 2 });
    const mc = modulusCm(plate);
    const b = moldConstantFrom({ ...plate, timeMin: 2 });
    const rule = riserModulusRule({ castingModulusCm: mc });
    const d = cylinderRiserDiameterCm({ timeMin: b * rule.minRiserModulusCm ** 2, moldConstant: b });
    expect(readout('Casting modulus M = V/A')).toHaveTextContent(`${formatNumber(mc * 10, 1)} mm`);
    expect(readout('Freezing time of the casting')).toHaveTextContent('2.00 min');
    expect(readout('Riser diameter')).toHaveTextContent(`${formatNumber(d * 10, 1)} mm`);
    expect(formatNumber(d * 10, 1)).toBe(formatNumber(6 * 1.2 * mc * 10, 1)); // H = D: D = 6·M_riser
    expect(screen.getByText('met: the riser freezes after the casting')).toBeInTheDocument();
  });
});

describe('PatternShrinkCalculator', () => {
  test('when a 300 mm casting is made on a 5/32 in/ft rule, then the pattern is patternDimension of it', async () => {
    const { user } = renderWithProviders(<PatternShrinkCalculator units={metric} />);

    await user.type(screen.getByRole('textbox', { name: /Casting dimension/ }), '300');

    const mm = patternDimension({ castingMm: 300, shrinkPct: shrinkPctFromInchesPerFoot(5 / 32) });
    expect(readout('Make the pattern')).toHaveTextContent(`${formatNumber(mm, 1)} mm`);
  });

  test('when a 12 in casting is made on a 1/8 in/ft rule, then the pattern is 12.125 in', async () => {
    const { user } = renderWithProviders(<PatternShrinkCalculator units={imperial} />);

    await user.selectOptions(screen.getByRole('combobox', { name: /Shrink rule/ }), '1/8 in/ft');
    await user.type(screen.getByRole('textbox', { name: /Casting dimension/ }), '12');

    const mm = patternDimension({ castingMm: 12 * 25.4, shrinkPct: shrinkPctFromInchesPerFoot(1 / 8) });
    expect(readout('Make the pattern')).toHaveTextContent(`${formatNumber(mm / 25.4, 3)} in`);
    expect(formatNumber(mm / 25.4, 3)).toBe('12.125');
  });
});
