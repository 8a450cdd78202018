import { Link } from 'react-router-dom';
import { useWatch, type Control } from 'react-hook-form';
import type { TeamChoices } from '../lib/preset-values';
import { profileCalibration } from '../../../../shared/library/profile-calibration';
import type { DesignValues } from '../lib/design-values';
import { formatLength, type LengthUnit } from '../lib/units';
import { SelectField } from './form/select-field';

const linkClass = 'font-medium text-ink underline underline-offset-4';

interface PrinterFieldProps {
  control: Control<DesignValues>;
  profiles: TeamChoices['printerProfiles'];
  teamMaterials: TeamChoices['teamMaterials'];
  unit: LengthUnit;
}

const signed = (mm: number, unit: LengthUnit) =>
  `${mm > 0 ? '+' : mm < 0 ? '−' : '±'}${formatLength(Math.abs(mm), unit)}`;

/**
 * The team's printer profiles for the chosen process. A chosen profile's calibration for this material and
 * fit replaces the typed correction, in the preview and in the downloaded kit alike.
 */
export function PrinterField({ control, profiles, teamMaterials, unit }: PrinterFieldProps) {
  const [process, material, fit, profileId, teamMaterialId] = useWatch({
    control,
    name: ['process', 'material', 'fit', 'printerProfileId', 'teamMaterialId'],
  });
  const teamMaterial = teamMaterials.find((m) => m.id === teamMaterialId && m.baseMaterial === material);
  const mine = profiles.filter((p) => p.process === process);
  const chosen = mine.find((p) => p.id === profileId) ?? null;
  const calibration = chosen ? profileCalibration(chosen, material, fit) : null;
  const unitWord = unit === 'mm' ? 'mm' : 'in';
  return (
    <div className="space-y-2">
      <SelectField
        control={control}
        name="printerProfileId"
        label="Printer profile"
        options={[
          { value: '', label: mine.length ? 'None: type a correction below' : 'None saved for this process' },
          ...mine.map((p) => ({ value: p.id, label: p.name })),
        ]}
      />
      {chosen && calibration && (
        <p className="text-sm text-ink-soft" data-testid="printer-calibration">
          {chosen.name} needs {signed(calibration.offsetMm, unit)} {unitWord} per side for {material} {fit} fits (from
          its calibration table).
        </p>
      )}
      {calibration && teamMaterial && (teamMaterial.clearanceAdjustments[fit] ?? 0) !== 0 && (
        <p className="text-sm text-ink-soft" data-testid="calibration-and-material">
          Both apply: {teamMaterial.name}’s own adjustment and this printer’s calibration for {material}. If that
          calibration was measured with {teamMaterial.name} itself, it already includes the difference: set Team
          material above to None so it is not counted twice.
        </p>
      )}
      {chosen && !calibration && (
        <p className="text-sm text-ink-soft" data-testid="printer-calibration">
          {chosen.name} has no calibration for {material} {fit} fits yet, so the published default is used.{' '}
          <Link to={`/printers/${chosen.id}/fit-tests`} className={linkClass}>
            Run a fit test
          </Link>{' '}
          to tune it.
        </p>
      )}
      {!mine.length && (
        <p className="text-sm text-ink-soft">
          <Link to="/printers" className={linkClass}>
            Add a printer profile
          </Link>{' '}
          to keep its fit-test numbers for every design.
        </p>
      )}
    </div>
  );
}
