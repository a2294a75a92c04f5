import { Link } from 'react-router-dom';
import { findDefectKind } from '#shared/domain/index.ts';
import { paths } from '#src/config/paths.ts';

// What tells a gas hole from a shrinkage void, in our words. The trade
// agrees on these without a single publication (common practice); the
// defect vocabulary's own note ("smooth walls separate gas from shrinkage")
// is cited under the table.
const ROWS = [
  {
    feature: 'Walls',
    gas: 'Smooth and round, often shiny inside',
    shrinkage: 'Rough and jagged; the tips of dendrites (tiny crystal branches) show',
  },
  {
    feature: 'Shape',
    gas: 'Round or drawn-out bubbles, each on its own',
    shrinkage: 'Irregular, branching, joined up like a sponge',
  },
  {
    feature: 'Where',
    gas: 'Spread evenly through the section (hydrogen from the melt), or high in the casting and beside cores (blowholes from the mould)',
    shrinkage: 'Heavy sections, junctions and corners, under a riser, along the centreline of a plate',
  },
  {
    feature: 'What changes it',
    gas: 'How dry and clean the melt is, degassing, the weather (dew point), mould moisture and venting',
    shrinkage: 'Riser size and placement, section design, pour temperature',
  },
] as const;

/** The "Gas or shrinkage?" aid, for the pages of both groups. */
export function GasOrShrinkage({ workshopId, current }: { workshopId: string; current: 'gas' | 'shrinkage' }) {
  const source = findDefectKind('gas_porosity')?.source;
  const other = current === 'gas' ? 'shrinkage_porosity' : 'gas_porosity';
  const otherKind = findDefectKind(other);
  return (
    <section aria-labelledby="gas-or-shrinkage" className="flex flex-col gap-3 rounded-lg border border-line bg-surface-raised p-4">
      <h2 id="gas-or-shrinkage" className="text-title font-semibold text-ink">
        Gas or shrinkage?
      </h2>
      <p className="max-w-prose text-body text-ink">
        Both leave holes. Look at the walls first, with a loupe if you have one: that settles most cases.
      </p>
      <div className="relative overflow-x-auto">
        <table className="w-full min-w-[36rem] border-collapse text-left text-body">
          <caption className="sr-only">How gas holes and shrinkage voids differ</caption>
          <thead>
            <tr className="border-b border-line-strong">
              <th scope="col" className="py-2 pr-3 font-semibold">
                Look at
              </th>
              <th scope="col" className="py-2 pr-3 font-semibold">
                Gas (porosity, pinholes, blowholes)
              </th>
              <th scope="col" className="py-2 font-semibold">
                Shrinkage
              </th>
            </tr>
          </thead>
          <tbody>
            {ROWS.map((row) => (
              <tr key={row.feature} className="border-b border-line align-top">
                <th scope="row" className="py-2 pr-3 font-medium">
                  {row.feature}
                </th>
                <td className="py-2 pr-3">{row.gas}</td>
                <td className="py-2">{row.shrinkage}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {otherKind ? (
        <p className="text-body">
          Sounds more like the other column?{' '}
          <Link to={paths.guideKind.getHref(workshopId, other)} className="font-medium text-link underline">
            Read {otherKind.name.toLowerCase()}
          </Link>
          .
        </p>
      ) : null}
      <p className="text-caption text-ink-muted">
        Source: common practice in the trade{source ? `; ${source.citation}` : ''}.
      </p>
    </section>
  );
}
