// The calculators, in the order the index shows them: the ones used before
// every pour first.

export const CALCULATOR_IDS = [
  'superheat',
  'charge',
  'yield',
  'setpoint',
  'temperature',
  'dew-point',
  'hydrogen',
  'solidification',
  'pattern-shrink',
] as const;
export type CalculatorId = (typeof CALCULATOR_IDS)[number];

export type CalculatorInfo = { id: CalculatorId; title: string; summary: string };

export const CALCULATORS: readonly CalculatorInfo[] = [
  { id: 'superheat', title: 'Superheat', summary: 'How far a pour temperature sits above the alloy’s liquidus, against its pouring ranges.' },
  { id: 'charge', title: 'Charge for a mould', summary: 'How much metal to weigh out for a mould, at your usual yield and a margin.' },
  { id: 'yield', title: 'Casting yield', summary: 'What share of the metal poured ended up as castings, and what goes back as returns.' },
  { id: 'setpoint', title: 'Furnace setpoint', summary: 'The setpoint that brings the metal to a target, learnt from this furnace’s own heats.' },
  { id: 'temperature', title: '°C and °F', summary: 'Convert a temperature either way, with the fixed points thermocouples are checked against.' },
  { id: 'dew-point', title: 'Dew point', summary: 'The dew point of the shop air, and how much hydrogen it may feed an aluminium melt.' },
  { id: 'hydrogen', title: 'Hydrogen solubility', summary: 'How much hydrogen liquid and solid aluminium can hold, from 600 to 850 °C.' },
  { id: 'solidification', title: 'Freezing time and riser', summary: 'Chvorinov’s rule for a plate, bar or cylinder, and the cylindrical riser that feeds it.' },
  { id: 'pattern-shrink', title: 'Pattern shrink allowance', summary: 'How big to make a pattern so the casting shrinks to size.' },
];

export function findCalculator(id: string): CalculatorInfo | undefined {
  return CALCULATORS.find((c) => c.id === id);
}
