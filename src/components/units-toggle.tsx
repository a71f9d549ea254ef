import { useDisplayUnits } from '../lib/display-units.tsx';
import { SegmentedChoice } from './segmented-choice.tsx';

/** The reader's units for every figure on the public pages: irradiance and length. */
export function UnitsToggle() {
  const units = useDisplayUnits();
  return (
    <div className="flex flex-wrap gap-6" aria-label="Units">
      <SegmentedChoice
        legend="Irradiance in"
        options={[
          { value: 'mW/cm²', label: 'mW/cm²' },
          { value: 'W/m²', label: 'W/m²' },
        ]}
        value={units.irradiance}
        onChange={(irradiance) => units.setUnits({ irradiance })}
      />
      <SegmentedChoice
        legend="Lengths in"
        options={[
          { value: 'cm', label: 'cm' },
          { value: 'in', label: 'inches' },
        ]}
        value={units.length}
        onChange={(length) => units.setUnits({ length })}
      />
    </div>
  );
}
