import { formatTemperature, type TemperatureUnit } from '#shared/domain/index.ts';
import { Caution } from '#src/components/ui/caution.tsx';

type Props = {
  unit: TemperatureUnit;
  /** The alloy's solidus, °C, when known: the temperature the oven must never reach. */
  solidusC?: number;
  designation?: string;
  hasQuench: boolean;
  className?: string;
};

/**
 * The cautions that go with every heat-treatment plan and its sheet. Facts:
 * quench handling and steam from UK HSE guidance and shop practice as in
 * DOMAIN.md §6.4 (the tongs and face-shield practice is from memory);
 * incipient melting near A356's 555 °C solidus and the eutectic at 577 °C
 * per DOMAIN.md §5 (from memory).
 */
export function HeatTreatmentCautions({ unit, solidusC, designation, hasQuench, className }: Props) {
  return (
    <div className={className ?? 'flex flex-col gap-3'}>
      <Caution heading="Hot parts and burns" safetySection="clothing">
        Castings, racks and the oven door stay hot enough to burn long after the oven is switched off. Handle them with dry tongs and heat-resistant
        gloves, and set them down where nobody will pick them up bare-handed.
      </Caution>
      {hasQuench ? (
        <Caution heading="Quench tanks and steam" level="danger" safetySection="quenching">
          Lower the casting into plenty of water with tongs, at arm’s length, face shield down. Never pour water onto hot metal: it flashes to steam
          and throws scalding water. A closed cavity can trap water or steam and burst.
        </Caution>
      ) : null}
      {solidusC !== undefined ? (
        <Caution heading={`Keep ${designation ?? 'the alloy'} below ${formatTemperature(solidusC, unit)}`}>
          Above the solidus ({formatTemperature(solidusC, unit)}; the Al-Si eutectic is at {formatTemperature(577, unit)}) the casting begins to melt at
          its grain boundaries and is spoiled. Check the oven with a separate thermocouple: a kiln that swings ±{unit === 'C' ? '10 °C' : '18 °F'} is
          already close.
        </Caution>
      ) : null}
      <Caution heading="Your supplier and your shop come first">
        These steps are the published schedule as the app holds it. Where the alloy supplier’s data sheet, your shop’s own procedure or a standard
        that applies to the work (ASTM B917 for castings in general, AMS 2771 for aerospace) says otherwise, follow that.
      </Caution>
    </div>
  );
}
