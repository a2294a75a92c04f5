import { ChevronRight, Cylinder, Droplets, Flame, Percent, Ruler, Scale, Thermometer, ThermometerSun, Wind, type LucideIcon } from 'lucide-react';
import { Link } from 'react-router-dom';
import { paths } from '#src/config/paths.ts';
import { CALCULATORS, type CalculatorId } from '../lib/calculator-list.ts';

const ICONS: Record<CalculatorId, LucideIcon> = {
  superheat: ThermometerSun,
  charge: Scale,
  yield: Percent,
  setpoint: Flame,
  temperature: Thermometer,
  'dew-point': Droplets,
  hydrogen: Wind,
  solidification: Cylinder,
  'pattern-shrink': Ruler,
};

/** Every calculator as a card; each opens its own page. */
export function CalculatorIndex({ workshopId }: { workshopId: string }) {
  return (
    <ul className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
      {CALCULATORS.map((c) => {
        const Icon = ICONS[c.id];
        return (
          <li key={c.id}>
            <Link
              to={paths.calculator.getHref(workshopId, c.id)}
              className="flex h-full min-h-12 items-start gap-3 rounded-lg border border-line bg-surface-raised p-4 text-ink no-underline hover:bg-surface-sunken"
            >
              <Icon aria-hidden className="mt-0.5 size-6 shrink-0 text-ink-muted" strokeWidth={1.75} />
              <span className="flex flex-1 flex-col gap-1">
                <span className="text-title font-semibold text-link underline">{c.title}</span>
                <span className="text-body text-ink-muted">{c.summary}</span>
              </span>
              <ChevronRight aria-hidden className="mt-1 size-5 shrink-0 text-ink-muted" />
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
