import type { ThermalInput, ThermalResult } from '@shared/calc/thermal/schema';
import { Cautions } from '../../../components/ui/Cautions';
import { FieldLink } from '../../../components/ui/FieldLink';
import { Notice } from '../../../components/ui/Notice';
import { PageSection } from '../../../components/ui/PageSection';
import { ResultSection } from '../../../components/ui/ResultSection';
import { THERMAL_CAUTIONS } from './Cautions';
import { MethodSection } from './MethodSection';
import { ResultFigures } from './ResultFigures';
import { SectionSketch } from './SectionSketch';
import { ShareChart } from './ShareChart';
import { ShowTheWork } from './ShowTheWork';

/** Re-exported for the builder and the read-only view; the primitive lives in components/ui. */
export { PageSection };

/** Plain words for a form path, for the list of what the result is waiting for. */
export function describePath(path: string, thermal: Partial<ThermalInput> | undefined): string {
  const parts = path.split('.');
  const FIELD: Record<string, string> = {
    thickness: 'thickness',
    conductivity: 'λ',
    resistance: 'declared R',
    sections: 'sections',
    fraction: 'area fraction',
    flangeWidth: 'flange width',
    spacing: 'spacing',
    spacingHorizontal: 'horizontal spacing',
    spacingVertical: 'vertical spacing',
    chi: 'χ',
    psi: 'ψ',
    countPerArea: 'count per area',
    lengthPerArea: 'length per area',
    diameter: 'diameter',
    recessDepth: 'recess depth',
    layerIndex: 'layer crossed',
    emissivityFactor: 'emittance E',
    name: 'name',
    metal: 'metal framing',
    bothEndsMetal: 'both ends on metal',
    materialId: 'library material',
  };
  if (parts[1] === 'layers' && parts[2] !== undefined) {
    const i = Number(parts[2]);
    const layer = thermal?.layers?.[i];
    const where = `Layer ${i + 1}${layer?.name ? ` (${layer.name})` : ''}`;
    if (parts[3] === 'sections' && parts[4] !== undefined)
      return `${where}, section ${Number(parts[4]) + 1}: ${FIELD[parts[5] ?? ''] ?? parts[5] ?? ''}`;
    return parts[3] ? `${where}: ${FIELD[parts[3]] ?? parts[3]}` : where;
  }
  if (parts[1] === 'bridges' && parts[2] !== undefined) {
    const j = Number(parts[2]);
    const b = thermal?.bridges?.[j];
    const where = `Bridge ${j + 1}${b?.name ? ` (${b.name})` : ''}`;
    return parts[3] ? `${where}: ${FIELD[parts[3]] ?? parts[3]}` : where;
  }
  if (parts[1] === 'layers') return 'Layers';
  if (parts[1] === 'heatFlow') return 'Heat-flow direction';
  return FIELD[parts[parts.length - 1] ?? ''] ?? path;
}

/** What stands between the input and a result, each linked to its field. */
export function WaitingFor({
  errors,
  thermal,
}: {
  errors: Record<string, string>;
  thermal: Partial<ThermalInput> | undefined;
}) {
  const entries = Object.entries(errors).filter(([k]) => k.startsWith('thermal'));
  if (entries.length === 0) return null;
  return (
    <Notice tone="caution" title="No result yet — the calculation needs:" live>
      <ul className="list-disc pl-5">
        {entries.map(([path, message]) => (
          <li key={path}>
            <FieldLink path={path}>{describePath(path, thermal)}</FieldLink>: {message}
          </li>
        ))}
      </ul>
    </Notice>
  );
}

interface ResultPanelProps {
  thermal: ThermalInput | undefined;
  girtOrientation: 'horizontal' | 'vertical';
  result: ThermalResult | null;
  errors: Record<string, string>;
  engineVersion?: string;
  /** Shown above the figures (e.g. "stored result" or "updates as you type"). */
  resultNote?: string;
  startAt?: number;
  /** The result is of an older input while a newer one is computed: marked "updating…" and dimmed. */
  stale?: boolean;
}

/** Method, result (figures, section, shares, the work) and cautions — the lower half of every page. */
export function ResultPanel({
  thermal,
  girtOrientation,
  result,
  errors,
  engineVersion,
  resultNote,
  startAt = 3,
  stale = false,
}: ResultPanelProps) {
  return (
    <>
      <PageSection n={startAt} title="Method" id="method-heading">
        {result ? (
          <MethodSection result={result} />
        ) : (
          <p className="text-ink-muted">The method is chosen once the build-up can be computed.</p>
        )}
      </PageSection>

      <ResultSection
        n={startAt + 1}
        title="Result"
        id="result-heading"
        stale={stale}
        note={resultNote}
        className="flex flex-col gap-4"
        work={
          thermal || result ? (
            <>
              {thermal ? <SectionSketch thermal={thermal} girtOrientation={girtOrientation} /> : null}
              {result ? (
                <>
                  <div className="flex flex-col gap-2">
                    <h4 className="font-serif text-lg">Where the heat goes</h4>
                    <ShareChart result={result} />
                  </div>
                  <ShowTheWork result={result} />
                </>
              ) : null}
            </>
          ) : null
        }
      >
        {result ? <ResultFigures result={result} /> : <WaitingFor errors={errors} thermal={thermal} />}
      </ResultSection>

      <Cautions items={THERMAL_CAUTIONS} engineVersion={engineVersion} />
    </>
  );
}
