import type { CurrentUser, PreferencesUpdate } from '#shared/auth/auth-schemas.ts';
import { SegmentedControl } from '#src/components/ui/segmented-control.tsx';

export type PreferenceCallbacks = { onSuccess?: () => void; onError?: (error: unknown) => void };
export type ChangePreferences = (update: PreferencesUpdate, callbacks?: PreferenceCallbacks) => void;

type ControlProps = { user: CurrentUser; onChange: ChangePreferences; compact?: boolean };

/** °C/°F and g/oz: every figure on every screen follows these. */
export function UnitToggles({ user, onChange, compact }: ControlProps) {
  return (
    <div className={compact ? 'flex flex-col gap-3' : 'grid gap-5 sm:grid-cols-2'}>
      <SegmentedControl
        legend="Temperature"
        mono
        value={user.temperatureUnit}
        onChange={(temperatureUnit) => onChange({ temperatureUnit })}
        options={[
          { value: 'C', label: '°C', description: 'degrees Celsius' },
          { value: 'F', label: '°F', description: 'degrees Fahrenheit' },
        ]}
      />
      <SegmentedControl
        legend="Weight"
        mono
        value={user.massUnit}
        onChange={(massUnit) => onChange({ massUnit })}
        options={[
          { value: 'g', label: 'g', description: 'grams' },
          { value: 'oz', label: 'oz', description: 'ounces' },
        ]}
      />
    </div>
  );
}

/** Light, dark, or whatever the device is set to. The shop floor often prefers dark. */
export function ThemePicker({ user, onChange }: ControlProps) {
  return (
    <SegmentedControl
      legend="Theme"
      value={user.theme}
      onChange={(theme) => onChange({ theme })}
      options={[
        { value: 'system', label: 'System', description: 'follow the device setting' },
        { value: 'light', label: 'Light' },
        { value: 'dark', label: 'Dark' },
      ]}
    />
  );
}
