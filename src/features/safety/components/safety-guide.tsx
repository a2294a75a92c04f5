import type { ReactNode } from 'react';
import { Caution } from '#src/components/ui/caution.tsx';

type Section = { id: string; title: string; caution: { heading: string; text: string; level?: 'caution' | 'danger' }; body: ReactNode };

const DEFER = 'Your local codes, your supplier’s instructions and safety data sheets, and the practice of a licensed or trained person come first wherever they say more than this page.';

const SECTIONS: Section[] = [
  {
    id: 'moisture',
    title: 'Water and molten metal',
    caution: {
      heading: 'Dry before it touches the melt',
      text: 'Water trapped under molten metal turns to steam at once and can throw metal out of the crucible or mould. Anything wet, damp or sealed stays out of the melt.',
      level: 'danger',
    },
    body: (
      <>
        <p>
          Water that turns to steam expands to roughly 1,600 to 1,700 times its volume. When that happens under or inside molten metal, the
          metal is thrown out (AFS Safety &amp; Health Committee, in Modern Casting).
        </p>
        <p>
          Wet scrap is the commonest cause of molten-metal explosions. Store scrap dry and under cover, and never charge sealed items: closed
          tubes, cans, aerosols, or any hollow part that could hold water or air (UK HSE, “Safety topics in the molten metal industries”).
        </p>
        <p>
          Preheat everything that goes into or touches the melt: tools, skimmers, stirring rods, thermocouple sheaths, alloy additions, flux and
          degassing tablets, and the moulds. Cold metal straight from a damp shed carries condensation.
        </p>
      </>
    ),
  },
  {
    id: 'clothing',
    title: 'Protective clothing',
    caution: {
      heading: 'Cover skin, and nothing that melts',
      text: 'Wear a face shield over safety glasses and clothing of natural or flame-resistant fibres. Synthetic fibres melt onto skin.',
    },
    body: (
      <>
        <p>
          A face shield goes over safety glasses, not instead of them. Wear natural or flame-resistant fibres, never synthetics. Trouser legs go
          over the boots, so a splash runs off rather than into them. Heat-resistant gauntlets protect hands and wrists.
        </p>
        <p>
          For aluminium, choose fabrics rated to EN ISO 11612 code D, the molten-aluminium splash test (UK HSE, “Levels of risk for work with
          molten metals”). Other metals have their own codes; the rating on the garment says which.
        </p>
      </>
    ),
  },
  {
    id: 'fume',
    title: 'Fume',
    caution: {
      heading: 'Extract fume at its source',
      text: 'Flux and degassing tablets give off fume that needs local exhaust ventilation. Zinc fume from brass or galvanised steel causes metal fume fever.',
    },
    body: (
      <>
        <p>
          Flux and degassing tablets release fume as they work. Use them under local exhaust ventilation that draws the fume away at the
          crucible, not a fan that spreads it round the shop.
        </p>
        <p>
          Zinc fume, from brass, some bronzes and galvanised steel, causes metal fume fever: flu-like shivers, aches and a raised temperature
          some hours after the melt. Keep galvanised items out of the charge, extract the fume, and see a doctor if symptoms come.
        </p>
      </>
    ),
  },
  {
    id: 'quenching',
    title: 'Quenching',
    caution: {
      heading: 'Metal goes into water, never water onto metal',
      text: 'Lower the casting with tongs, at arm’s length, into plenty of water. Stand clear of the steam.',
    },
    body: (
      <>
        <p>
          Lower the casting into the quench with tongs, at arm’s length, and into plenty of water, so it is covered and the water does not boil
          away around it. Never pour water onto hot metal: the steam comes back at you.
        </p>
        <p>Keep the quench tank away from where the metal is melted and poured, so a splash cannot reach the melt.</p>
      </>
    ),
  },
  {
    id: 'crucibles',
    title: 'Crucibles',
    caution: {
      heading: 'Retire a doubtful crucible',
      text: 'Check every crucible before each melt. A crucible that is cracked, thinned, was dropped or got wet is retired, not used once more.',
    },
    body: (
      <>
        <p>
          Before each melt, look over the crucible inside and out for cracks and for walls that have thinned. A crucible that was dropped or
          got wet is retired even if it looks whole: the damage may not show until it fails full of metal.
        </p>
        <p>Use tongs and a shank that fit the crucible’s size and shape, and lift it the same way each time.</p>
      </>
    ),
  },
];

/** The safety page: calm general cautions for casters. */
export function SafetyGuide() {
  return (
    <div className="flex flex-col gap-8">
      <p className="max-w-prose text-lead text-ink">
        Casting is safe work when the same few habits are kept every time. These are general cautions for small shops, classes and home
        workshops. {DEFER}
      </p>

      <nav aria-label="On this page" className="max-w-prose rounded-md bg-surface-sunken p-4">
        <h2 className="mb-2 text-body font-semibold">On this page</h2>
        <ul className="flex flex-col gap-1">
          {SECTIONS.map((section) => (
            <li key={section.id}>
              <a href={`#${section.id}`} className="inline-flex min-h-12 items-center underline lg:min-h-8">
                {section.title}
              </a>
            </li>
          ))}
        </ul>
      </nav>

      {SECTIONS.map((section) => (
        <section key={section.id} id={section.id} aria-labelledby={`${section.id}-title`} className="flex max-w-prose scroll-mt-20 flex-col gap-4">
          <h2 id={`${section.id}-title`} className="text-title font-semibold text-ink">
            {section.title}
          </h2>
          <Caution heading={section.caution.heading} level={section.caution.level} safetySection={false}>
            {section.caution.text}
          </Caution>
          <div className="flex flex-col gap-3 text-body text-ink">{section.body}</div>
          <p className="text-caption text-ink-muted">{DEFER}</p>
        </section>
      ))}

      <section aria-labelledby="sources-title" className="max-w-prose">
        <h2 id="sources-title" className="mb-2 text-title font-semibold">
          Sources
        </h2>
        <ul className="list-disc pl-5 text-body">
          <li>AFS Safety &amp; Health Committee, articles on molten metal and moisture, Modern Casting.</li>
          <li>UK Health and Safety Executive, “Safety topics in the molten metal industries”.</li>
          <li>UK Health and Safety Executive, “Levels of risk for work with molten metals”.</li>
        </ul>
      </section>
    </div>
  );
}
