import {
  expansionMaterials,
  findExpansionMaterial,
  GENERIC_EXPANSION_NOTE,
} from '@shared/calc/joints/expansion';
import { DEFAULT_MINIMUM_WIDTH } from '@shared/calc/joints/joints';
import {
  BACKER_CELLS,
  type BackerCell,
  JOINT_TYPES,
  type JointInput,
  type JointSide,
  type JointType,
  MOVEMENT_CLASSES,
  type MovementClass,
} from '@shared/calc/joints/schema';
import { formatJointDimension, formatPageMeasure } from '@shared/format/page-measures';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { FieldGroup, GroupProblem } from '../../../components/ui/FieldGroup';
import { NamedOptions, Options } from '../../../components/ui/Options';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { RadioGroup } from '../../../components/ui/RadioGroup';
import { Select } from '../../../components/ui/Select';
import { TextInput } from '../../../components/ui/TextInput';
import { type FieldProblems, fieldDomId, problemText } from '../../../lib/field-problems';
import { pageInput } from '../../../lib/input-measure';
import { useUnitSystem } from '../../../lib/unit-system';
import { type AirDesign, newSide, removeAt, replaceAt } from '../draft';
import { BACKER_LABELS, JOINT_TYPE_LABELS, MOVEMENT_CLASS_LABELS } from '../labels';
import { SurfaceSuggest } from './SurfaceSuggest';

const CUSTOM = '__custom';

interface JointEditorProps {
  joint: JointInput;
  index: number;
  onChange: (joint: JointInput) => void;
  problems: FieldProblems;
  air: AirDesign | null;
}

/** Every input of one joint, each box with its unit and its problem beside it. */
export function JointEditor({ joint, index, onChange, problems, air }: JointEditorProps) {
  const system = useUnitSystem();
  const base = `joints.${index}`;
  const path = (k: string) => `${base}.${k}`;
  const pr = (k: string) => problems[path(k)];
  const set = (changes: Partial<JointInput>) => onChange({ ...joint, ...changes });
  const install = joint.installationTemperature;
  const ranged = typeof install !== 'number';

  function setSide(k: number, side: JointSide) {
    set({ sides: replaceAt(joint.sides, k, side) });
  }

  function setOther(key: 'extension' | 'compression', v: number | undefined) {
    const other = {
      extension: joint.otherMovement?.extension,
      compression: joint.otherMovement?.compression,
    };
    other[key] = v;
    const otherKey = key === 'extension' ? 'compression' : 'extension';
    if (other[key] === undefined && other[otherKey] === undefined) {
      const { otherMovement: _, ...rest } = joint;
      onChange(rest);
      return;
    }
    set({ otherMovement: { extension: other.extension ?? 0, compression: other.compression ?? 0 } });
  }

  function setOptional<K extends 'designDepth' | 'minimumPracticalWidth' | 'openingDepth'>(
    key: K,
    v: number | undefined,
  ) {
    if (v === undefined) {
      const next = { ...joint };
      delete next[key];
      onChange(next);
    } else set({ [key]: v } as Partial<JointInput>);
  }

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2 lg:grid-cols-4">
        <Field
          label="Joint mark"
          required
          error={pr('name') && problemText(pr('name')!, undefined, system)}
          id={fieldDomId(path('name'))}
          className="sm:col-span-2"
        >
          {(c) => (
            <TextInput
              {...c}
              value={joint.name}
              maxLength={120}
              onChange={(e) => set({ name: e.target.value })}
              className="py-1.5 text-sm"
            />
          )}
        </Field>
        <Field label="Where it sits" id={fieldDomId(path('type'))}>
          {(c) => (
            <Select
              {...c}
              value={joint.type}
              onChange={(e) => set({ type: e.target.value as JointType })}
              className="py-1.5 text-sm"
            >
              <Options values={JOINT_TYPES} labels={JOINT_TYPE_LABELS} />
            </Select>
          )}
        </Field>
        <Field
          label="Sealant movement class"
          id={fieldDomId(path('sealant.movementClass'))}
          hint="ASTM C920 class declared by the maker."
          error={pr('sealant.movementClass') && problemText(pr('sealant.movementClass')!, undefined, system)}
        >
          {(c) => (
            <Select
              {...c}
              value={joint.sealant.movementClass}
              onChange={(e) => set({ sealant: { movementClass: e.target.value as MovementClass } })}
              className="py-1.5 text-sm"
            >
              <Options values={MOVEMENT_CLASSES} labels={MOVEMENT_CLASS_LABELS} />
            </Select>
          )}
        </Field>
        <QuantityInput
          id={fieldDomId(path('designWidth'))}
          label="Design width"
          measure={pageInput('joint')}
          value={joint.designWidth}
          onChange={(v) => set({ designWidth: v ?? Number.NaN })}
          problem={pr('designWidth')}
          hint="Width as drawn, at installation."
        />
        <QuantityInput
          id={fieldDomId(path('designDepth'))}
          label="Design depth"
          measure={pageInput('joint')}
          required={false}
          value={joint.designDepth}
          onChange={(v, entry) => setOptional('designDepth', entry === 'invalid' ? Number.NaN : v)}
          problem={pr('designDepth')}
          hint="Optional: checked against the depth rule."
        />
        <QuantityInput
          id={fieldDomId(path('constructionTolerance'))}
          label="Construction tolerance"
          measure={pageInput('joint')}
          value={joint.constructionTolerance}
          onChange={(v) => set({ constructionTolerance: v ?? Number.NaN })}
          problem={pr('constructionTolerance')}
          hint="Added to the width needed for movement."
        />
      </div>

      <FieldGroup
        legend="Moving sides"
        note="One side when the joint meets fixed construction; two when both substrates move. Length L is the run of material that feeds movement into this joint."
      >
        <GroupProblem path={path('sides')} problem={pr('sides')} />
        {joint.sides.map((side, k) => {
          const row = 'material' in side ? findExpansionMaterial(side.material) : undefined;
          const sp = (key: string) => pr(`sides.${k}.${key}`);
          return (
            <div
              // biome-ignore lint/suspicious/noArrayIndexKey: at most two sides, addressed by position
              key={k}
              className="grid gap-x-4 gap-y-2 border-l-2 border-rule pl-3 sm:grid-cols-[2fr_1fr_auto]"
            >
              <div className="flex flex-col gap-2">
                <Field
                  label={`Side ${k + 1} material`}
                  id={fieldDomId(path(`sides.${k}.material`))}
                  error={sp('material') && problemText(sp('material')!, undefined, system)}
                >
                  {(c) => (
                    <Select
                      {...c}
                      className="py-1.5 text-sm"
                      value={'material' in side ? side.material : CUSTOM}
                      onChange={(e) => {
                        const v = e.target.value;
                        if (v === CUSTOM)
                          setSide(k, {
                            alpha: 'alpha' in side ? side.alpha : 12e-6,
                            label: 'Declared product value',
                            length: side.length,
                          });
                        else setSide(k, { material: v, length: side.length });
                      }}
                    >
                      <NamedOptions items={expansionMaterials} />
                      <option value={CUSTOM}>Custom α (the product's declared value)</option>
                    </Select>
                  )}
                </Field>
                {'material' in side ? (
                  row ? (
                    <p className="text-xs text-ink-muted">
                      <span className="num text-ink">
                        α = {formatPageMeasure(row.alpha, 'alpha', system)}
                      </span>{' '}
                      · {row.source}
                      <span className="block">{GENERIC_EXPANSION_NOTE}.</span>
                    </p>
                  ) : null
                ) : (
                  <div className="grid gap-2 sm:grid-cols-2">
                    <QuantityInput
                      id={fieldDomId(path(`sides.${k}.alpha`))}
                      label="Declared α"
                      measure={pageInput('alpha')}
                      value={side.alpha}
                      onChange={(v) => setSide(k, { ...side, alpha: v ?? Number.NaN })}
                      problem={sp('alpha')}
                    />
                    <Field
                      label="Whose α"
                      id={fieldDomId(path(`sides.${k}.label`))}
                      hint="Product and data sheet."
                    >
                      {(c) => (
                        <TextInput
                          {...c}
                          className="py-1.5 text-sm"
                          maxLength={120}
                          value={side.label ?? ''}
                          onChange={(e) => setSide(k, { ...side, label: e.target.value || undefined })}
                        />
                      )}
                    </Field>
                  </div>
                )}
              </div>
              <QuantityInput
                id={fieldDomId(path(`sides.${k}.length`))}
                label="Moving length L"
                measure={pageInput('length')}
                value={side.length}
                onChange={(v) => setSide(k, { ...side, length: v ?? Number.NaN })}
                problem={sp('length')}
                hint="Panel length if fixed at its far end; half if anchored mid-length."
              />
              <div className="flex items-start pt-6">
                {joint.sides.length > 1 ? (
                  <Button
                    variant="quiet"
                    onClick={() => set({ sides: removeAt(joint.sides, k) })}
                    aria-label={`Remove side ${k + 1}`}
                  >
                    Remove
                  </Button>
                ) : null}
              </div>
            </div>
          );
        })}
        {joint.sides.length < 2 ? (
          <div>
            <Button
              variant="secondary"
              onClick={() => set({ sides: [...joint.sides, newSide(joint.sides[0])] })}
            >
              Add a second moving side
            </Button>
          </div>
        ) : null}
      </FieldGroup>

      <FieldGroup
        legend="Temperatures"
        note="The sealant follows the surface temperature of the moving material, not the air: dark metal in sun runs far above the air."
      >
        <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2 lg:grid-cols-4">
          <QuantityInput
            id={fieldDomId(path('surfaceTemperatureRange.min'))}
            label="Lowest surface temperature"
            measure={pageInput('temperature')}
            value={joint.surfaceTemperatureRange.min}
            onChange={(v) =>
              set({ surfaceTemperatureRange: { ...joint.surfaceTemperatureRange, min: v ?? Number.NaN } })
            }
            problem={pr('surfaceTemperatureRange.min')}
          />
          <QuantityInput
            id={fieldDomId(path('surfaceTemperatureRange.max'))}
            label="Highest surface temperature"
            measure={pageInput('temperature')}
            value={joint.surfaceTemperatureRange.max}
            onChange={(v) =>
              set({ surfaceTemperatureRange: { ...joint.surfaceTemperatureRange, max: v ?? Number.NaN } })
            }
            problem={pr('surfaceTemperatureRange.max')}
          />
          <RadioGroup
            legend="Installation temperature"
            name={`${base}-install`}
            options={[
              { value: 'one', label: 'one temperature' },
              { value: 'range', label: 'a range (season unknown)' },
            ]}
            value={ranged ? 'range' : 'one'}
            // A radio changes only to the other choice: one temperature becomes a range around it, a range its middle.
            onChange={() =>
              set({
                installationTemperature: ranged
                  ? (install.min + install.max) / 2
                  : { min: install - 10, max: install + 10 },
              })
            }
            className="sm:col-span-2"
          >
            {ranged ? (
              <div className="grid gap-3 sm:grid-cols-2">
                <QuantityInput
                  id={fieldDomId(path('installationTemperature.min'))}
                  label="Coolest at installation"
                  measure={pageInput('temperature')}
                  value={install.min}
                  onChange={(v) => set({ installationTemperature: { ...install, min: v ?? Number.NaN } })}
                  problem={pr('installationTemperature.min')}
                />
                <QuantityInput
                  id={fieldDomId(path('installationTemperature.max'))}
                  label="Warmest at installation"
                  measure={pageInput('temperature')}
                  value={install.max}
                  onChange={(v) => set({ installationTemperature: { ...install, max: v ?? Number.NaN } })}
                  problem={pr('installationTemperature.max')}
                />
              </div>
            ) : (
              <QuantityInput
                id={fieldDomId(path('installationTemperature'))}
                label="Surface temperature at installation"
                measure={pageInput('temperature')}
                value={install}
                onChange={(v) => set({ installationTemperature: v ?? Number.NaN })}
                problem={pr('installationTemperature')}
              />
            )}
          </RadioGroup>
        </div>
        <GroupProblem path={path('surfaceTemperatureRange')} problem={pr('surfaceTemperatureRange')} />
        {ranged ? (
          <GroupProblem path={path('installationTemperature')} problem={pr('installationTemperature')} />
        ) : null}
        <SurfaceSuggest air={air} onUse={(range) => set({ surfaceTemperatureRange: range })} />
      </FieldGroup>

      <FieldGroup
        legend="Other movement"
        note="Non-thermal movement you expect (moisture, creep, storey drift, seismic); leave blank for none."
      >
        <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2 lg:grid-cols-4">
          <QuantityInput
            id={fieldDomId(path('otherMovement.extension'))}
            label="Other opening"
            measure={pageInput('joint')}
            required={false}
            value={joint.otherMovement?.extension}
            onChange={(v, entry) => setOther('extension', entry === 'invalid' ? Number.NaN : v)}
            problem={pr('otherMovement.extension')}
          />
          <QuantityInput
            id={fieldDomId(path('otherMovement.compression'))}
            label="Other closing"
            measure={pageInput('joint')}
            required={false}
            value={joint.otherMovement?.compression}
            onChange={(v, entry) => setOther('compression', entry === 'invalid' ? Number.NaN : v)}
            problem={pr('otherMovement.compression')}
          />
        </div>
      </FieldGroup>

      <FieldGroup legend="Backer and opening">
        <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2 lg:grid-cols-4">
          <Field label="Backer rod" id={fieldDomId(path('backer'))}>
            {(c) => (
              <Select
                {...c}
                className="py-1.5 text-sm"
                value={joint.backer ?? 'closed_cell'}
                onChange={(e) => set({ backer: e.target.value as BackerCell })}
              >
                <Options values={BACKER_CELLS} labels={BACKER_LABELS} />
              </Select>
            )}
          </Field>
          <QuantityInput
            id={fieldDomId(path('openingDepth'))}
            label="Opening depth"
            measure={pageInput('joint')}
            required={false}
            value={joint.openingDepth}
            onChange={(v, entry) => setOptional('openingDepth', entry === 'invalid' ? Number.NaN : v)}
            problem={pr('openingDepth')}
            hint="Face to back stop; decides rod or bond-breaker tape."
          />
          <QuantityInput
            id={fieldDomId(path('minimumPracticalWidth'))}
            label="Smallest workable width"
            measure={pageInput('joint')}
            required={false}
            value={joint.minimumPracticalWidth}
            onChange={(v, entry) =>
              setOptional('minimumPracticalWidth', entry === 'invalid' ? Number.NaN : v)
            }
            problem={pr('minimumPracticalWidth')}
            placeholder={formatJointDimension(DEFAULT_MINIMUM_WIDTH, system).replace(/\s*(mm|in)$/, '')}
            hint={`Blank = ${formatJointDimension(DEFAULT_MINIMUM_WIDTH, system)} (common trade practice).`}
          />
        </div>
      </FieldGroup>
    </div>
  );
}
