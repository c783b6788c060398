import { can } from '@shared/auth/permissions';
import { ENGINE_VERSION } from '@shared/calc/trace';
import { CAUTIONS, DEFAULT_DEFLECTION_WIND_FACTOR } from '@shared/calc/wind/attachment';
import { messageText } from '@shared/format';
import type { Assembly } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import { Link } from 'react-router';
import { Cautions } from '../../../components/ui/Cautions';
import { Notice } from '../../../components/ui/Notice';
import { PageSection } from '../../../components/ui/PageSection';
import { COMPUTED_AS_YOU_TYPE, ResultSection } from '../../../components/ui/ResultSection';
import { RevisionHeader } from '../../../components/ui/RevisionHeader';
import { RevisionSaveBar } from '../../../components/ui/RevisionSaveBar';
import { ShowTheWork } from '../../../components/ui/ShowTheWork';
import { REVISION_SAVE_WORDS } from '../../../lib/revision-save-words';
import { useUnitSystem } from '../../../lib/unit-system';
import { type AttachmentEditingOptions, useAttachmentEditing } from '../use-attachment-editing';
import { AttachmentSummary } from './AttachmentSummary';
import type { AttachmentLibrary } from './LibraryPick';
import { MissingData } from './MissingData';
import { DesignSpacingInputs, PanelInputs } from './PanelInputs';
import { BuildingDimensions, ProjectWindSummary } from './ProjectWindSummary';
import { DesignChecksTable, ScheduleTable } from './ScheduleTable';
import { VelocityBlock } from './VelocityBlock';
import { WallElevation } from './WallElevation';
import { WindMethod } from './WindMethod';

/** The first caution, which must not be missed: who is responsible, whose values govern, what is not checked. */
const LEAD_CAUTION = (
  <strong className="font-semibold">
    The engineer of record or the delegated-design engineer is responsible for the cladding attachment, and
    the manufacturer’s tested values govern. Girts, their connections and the backup structure are not checked
    here.
  </strong>
);

type Props = Omit<AttachmentEditingOptions, 'system' | 'project' | 'assembly'> & {
  project: Project;
  assembly: Assembly;
  /** The firm library of panel tables and clips offered here (null when the person has no firm). */
  library: AttachmentLibrary | null;
};

/**
 * The attachment (wind) page of one assembly, read top to bottom like a calculation page: the project's wind and
 * building data, the design spacings, the panel table and clip; the method; the schedule per wall zone with the
 * elevation, the checks at the design spacing and the velocity pressure; the work; the cautions. It recomputes in
 * the browser with the shared engine on every keystroke.
 */
export function AttachmentView({ project, assembly, library, ...io }: Props) {
  const system = useUnitSystem();
  const editing = useAttachmentEditing({ project, assembly, system, ...io });
  const { form, values, evaluation, errors, base, stale } = editing;
  const archived = project.archivedAt !== null;
  const mayWrite = can(project.myRole, 'assembly.write') && !archived;
  const mayEditWind = can(project.myRole, 'project.wind.update') && !archived;
  const mayEditSite = can(project.myRole, 'project.update') && !archived;
  const { result, input, zones } = evaluation;
  const windHref = `/projects/${project.id}/wind`;
  const builderHref = `/projects/${project.id}/assemblies/${assembly.id}`;
  const hasDesign = evaluation.design.girtSpacing !== undefined;
  const deflectionLimit = input?.panel.loadSpanTable.deflectionLimit ?? values.deflectionLimit;

  return (
    <div className="flex flex-col gap-10 pb-4">
      <RevisionHeader page="Attachment page" assembly={base} readOnly={!mayWrite} title={base.name}>
        <p className="text-sm text-ink-muted">
          Girt and clip spacing for the design wind pressure on the wall, zone by zone
          {mayWrite ? ' — recomputed in your browser as you type.' : '.'}
        </p>
      </RevisionHeader>

      <AttachmentSummary result={result} zones={zones} stale={stale} system={system} />

      <PageSection
        n={1}
        title="Inputs — site and wind"
        id="wind-site-heading"
        aside={
          <Link to={mayEditWind ? `${windHref}?edit=1` : windHref} className="text-sm">
            {mayEditWind ? 'Edit the project’s wind data' : 'Open the project’s wind data'}
          </Link>
        }
      >
        <ProjectWindSummary project={project} />
        <BuildingDimensions project={project} editable={mayEditSite} />
        <p className="text-sm">
          Girts run <strong>{base.current.input.attachment.girtOrientation}</strong>
          {base.current.input.attachment.girtOrientation === 'horizontal'
            ? ' (panels span vertically)'
            : ' (panels span horizontally)'}
          {base.current.input.attachment.clipType ? `; clip: ${base.current.input.attachment.clipType}` : ''}
          {base.current.input.attachment.fastenerType
            ? `; fastener: ${base.current.input.attachment.fastenerType}`
            : ''}
          . <Link to={builderHref}>Set on the build-up page</Link>.
        </p>
      </PageSection>

      <PageSection n={2} title="Inputs — design spacing" id="wind-design-heading">
        <DesignSpacingInputs form={form} errors={errors} disabled={!mayWrite} />
      </PageSection>

      <PageSection n={3} title="Inputs — panel and clip" id="panel-heading">
        <p className="max-w-prose text-sm text-ink-muted">
          Enter the maker’s published, tested values of the actual product, gauge and fastener pattern — or
          take them from your firm’s library — and check that the table’s span condition matches the girt
          layout. Name the source of each: it is printed beside the values on the compliance sheet.
        </p>
        <PanelInputs form={form} values={values} errors={errors} disabled={!mayWrite} library={library} />
      </PageSection>

      <PageSection n={4} title="Method" id="wind-method-heading">
        {result && input ? (
          <WindMethod result={result} input={input} />
        ) : (
          <p className="text-ink-muted">
            ASCE 7 chapters 26 and 30, components and cladding on walls; the equations of the project’s
            edition follow once the page can be computed.
          </p>
        )}
      </PageSection>

      <ResultSection
        n={5}
        title="Result"
        id="wind-result-heading"
        stale={stale}
        note={mayWrite ? COMPUTED_AS_YOU_TYPE : undefined}
        className="flex flex-col gap-6"
        work={result ? <ShowTheWork steps={result.trace} /> : null}
      >
        {result && input ? (
          <>
            <WallElevation
              length={input.site.planLength}
              height={input.site.meanRoofHeight}
              edgeWidth={result.edgeWidth}
              girtOrientation={input.panel.girtOrientation}
              girtSpacing={evaluation.design.girtSpacing}
            />
            <ScheduleTable result={result} zones={zones} deflectionLimit={deflectionLimit} />
            {hasDesign ? (
              <DesignChecksTable
                zones={zones}
                deflectionLimit={deflectionLimit}
                deflectionFactor={input.panel.deflectionWindFactor ?? DEFAULT_DEFLECTION_WIND_FACTOR}
              />
            ) : (
              <p className="text-sm text-ink-muted">
                Enter a design girt spacing (section 2) to check it against the table and the clip.
              </p>
            )}
            {result.warnings.length > 0 ? (
              <Notice tone="warning" title="Read with the schedule:">
                <ul className="list-disc pl-5">
                  {result.warnings.map((w) => (
                    <li key={JSON.stringify(w)}>{messageText(w, system)}</li>
                  ))}
                </ul>
              </Notice>
            ) : null}
            <VelocityBlock result={result} />
          </>
        ) : (
          <MissingData
            projectId={project.id}
            missing={evaluation.missing}
            site={evaluation.site}
            errors={errors}
          />
        )}
      </ResultSection>

      <Cautions items={[LEAD_CAUTION, ...CAUTIONS]} engineVersion={ENGINE_VERSION} />

      {mayWrite ? (
        <RevisionSaveBar
          editing={editing}
          words={REVISION_SAVE_WORDS.attachment}
          undo
          conflictDetail={
            editing.conflict ? (
              <p>
                <strong>Carry my values over</strong> starts from revision {editing.conflict.theirs.revision}{' '}
                and puts your design spacings, panel table and clip on top of it; their other changes
                (build-up, vapour, joints) stay.
                {editing.conflict.carry?.detail.theyChangedWind
                  ? ' They also changed the wind inputs of this page — yours replace theirs, so compare first.'
                  : ''}{' '}
                Nothing is saved until you save again.
              </p>
            ) : null
          }
        />
      ) : null}
      {archived ? (
        <p className="text-sm text-ink-muted">
          The project is archived, so its assemblies are shown read-only.
        </p>
      ) : !mayWrite ? (
        <p className="text-sm text-ink-muted">
          Your role on this project shows the attachment inputs read-only.
        </p>
      ) : null}
    </div>
  );
}
