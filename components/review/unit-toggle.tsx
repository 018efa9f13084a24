/**
 * Units for visitors of a review link, who have no account setting: SI or IP, remembered on this device. The
 * first guess follows the browser's locale (US English reads IP).
 */
import { useEffect, useState } from 'react';
import type { UnitSystem } from '@/lib/units';
import { SegmentedControl } from '@/components/ui/segmented-control';

const KEY = 'tubeloom.guestUnits';

function initialUnits(): UnitSystem {
  try {
    const stored = typeof localStorage === 'undefined' ? null : localStorage.getItem(KEY);
    if (stored === 'si' || stored === 'ip') return stored;
  } catch {
    // no storage: fall through to the locale
  }
  const lang = typeof navigator === 'undefined' ? '' : navigator.language;
  return lang === 'en-US' ? 'ip' : 'si';
}

export function useGuestUnits(): [UnitSystem, (next: UnitSystem) => void] {
  const [units, setUnits] = useState<UnitSystem>('si');
  useEffect(() => setUnits(initialUnits()), []);
  const choose = (next: UnitSystem) => {
    setUnits(next);
    try {
      if (typeof localStorage !== 'undefined') localStorage.setItem(KEY, next);
    } catch {
      // remembered for this visit only
    }
  };
  return [units, choose];
}

export function UnitToggle({ value, onChange }: { value: UnitSystem; onChange: (next: UnitSystem) => void }) {
  return (
    <SegmentedControl<UnitSystem>
      label="Units"
      value={value}
      onChange={onChange}
      options={[
        { value: 'si', label: 'SI units', accessibilityLabel: 'SI units: kW, kPa, °C' },
        { value: 'ip', label: 'IP units', accessibilityLabel: 'IP units: MBH, ft of water, °F' },
      ]}
      testID="review-units"
    />
  );
}
