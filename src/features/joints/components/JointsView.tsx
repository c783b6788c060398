import { can } from '@shared/auth/permissions';
import type { JointInput } from '@shared/calc/joints/schema';
import type { TakeoffInput } from '@shared/calc/takeoff/schema';
import { ENGINE_VERSION } from '@shared/calc/trace';
import { type Assembly, type AssemblyInput, assemblyInputSchema } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import { useMemo, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Cautions } from '../../../components/ui/Cautions';
import { PageSection } from '../../../components/ui/PageSection';
import { COMPUTED_AS_YOU_TYPE, ResultSection } from '../../../components/ui/ResultSection';
import { staleProps } from '../../../components/ui/ResultSummary';
import { RevisionHeader } from '../../../components/ui/RevisionHeader';
import { NewerRevisionNotice, RevisionSaveBar } from '../../../components/ui/RevisionSaveBar';
import { useDeferredCalculation } from '../../../lib/deferred-calculation';
import { issueLines } from '../../../lib/issue-words';
import { REVISION_SAVE_WORDS } from '../../../lib/revision-save-words';
import { type RevisionApi, useRevisionEditing } from '../../../lib/use-revision-editing';
import { ElevationEditor } from '../../takeoff/components/ElevationEditor';
import { ElevationTable } from '../../takeoff/components/ElevationTable';
import { TAKEOFF_CAUTIONS } from '../../takeoff/components/TakeoffCautions';
import { TakeoffProblems } from '../../takeoff/components/TakeoffProblems';
import { TakeoffTable } from '../../takeoff/components/TakeoffTable';
import { blankTakeoff } from '../../takeoff/draft';
import { evaluateTakeoff } from '../../takeoff/evaluate';
import { evaluateJoints } from '../evaluate';
import { JOINT_CAUTIONS } from './JointCautions';
import { JointInputsTable } from './JointInputsTable';
import { JointMethod } from './JointMethod';
import { JointScheduleEditor } from './JointScheduleEditor';
import { JointsSummary } from './JointsSummary';
import { ScheduleTable } from './ScheduleTable';

const same = (x: unknown, y: unknown) => JSON.stringify(x) === JSON.stringify(y);

/** What this page edits of the assembly. */
interface JointsValues {
  joints: JointInput[];
  takeoff: TakeoffInput | undefined;
}

const jointsValues = (input: AssemblyInput): JointsValues => ({
  joints: input.joints ?? [],
  takeoff: input.takeoff,
});

type Props = RevisionApi & { project: Project; assembly: Assembly };

/**
 * The joints & quantities page of one assembly: the joint schedule (sealant joints sized for the panels'
 * thermal movement) and the elevation takeoff, computed in the browser as you type and saved together as a
 * new revision of the assembly.
 */
export function JointsView({ project, assembly, ...revisionApi }: Props) {
  const mayWrite = can(project.myRole, 'assembly.write') && project.archivedAt === null;

  const [joints, setJoints] = useState<JointInput[]>(assembly.current.input.joints ?? []);
  const [takeoff, setTakeoff] = useState<TakeoffInput | undefined>(assembly.current.input.takeoff);
  const [selected, setSelected] = useState(0);

  const jointsEval = useMemo(() => evaluateJoints(joints), [joints]);
  const takeoffEval = useMemo(() => (takeoff ? evaluateTakeoff(takeoff) : null), [takeoff]);
  const problemCount =
    Object.keys(jointsEval.problems).length + Object.keys(takeoffEval?.problems ?? {}).length;
  // The results (summary, method, schedule, takeoff, the bar) come from one evaluation of the input as React
  // defers it, marked "updating…" while it lags; the editors beside the inputs read the current one.
  const { result: shown, stale } = useDeferredCalculation(
    { joints, takeoff },
    (v) => ({
      ...v,
      jointsEval: evaluateJoints(v.joints),
      takeoffEval: v.takeoff ? evaluateTakeoff(v.takeoff) : null,
    }),
    [],
  );

  const air = { min: project.winterDesignTempC, max: project.summerDesignTempC };

  // Saving writes a new revision; a stale save carries the joints and takeoff as they are onto theirs.
  const editing = useRevisionEditing<JointsValues>({
    ...revisionApi,
    assembly,
    values: { joints, takeoff },
    isEdited: (v, base) =>
      !same(v.joints, base.current.input.joints ?? []) || !same(v.takeoff, base.current.input.takeoff),
    reset: (v, why) => {
      setJoints(v.joints);
      setTakeoff(v.takeoff);
      if (why === 'theirs') setSelected(0);
    },
    formValues: jointsValues,
    toInput: (v, base) => {
      if (problemCount > 0)
        return { problem: ['Some values cannot be used yet: put right the values marked ✕ first.'] };
      const { joints: _j, takeoff: _t, ...rest } = base.current.input;
      const input: AssemblyInput = {
        ...rest,
        ...(v.joints.length > 0 ? { joints: v.joints } : {}),
        ...(v.takeoff ? { takeoff: v.takeoff } : {}),
      };
      const parsed = assemblyInputSchema.safeParse(input);
      return parsed.success
        ? { input: parsed.data }
        : {
            problem: ['The assembly would not be accepted:', ...issueLines(parsed.error.issues, 'assembly')],
          };
    },
    carryOver: () => ({ detail: undefined }),
    markCarried: false,
    noteAlone: 'guards',
    notAccepted: (unmapped) => [
      'The server did not accept some values:',
      ...unmapped.map(([k, v]) => `${k}: ${v}`),
    ],
  });

  function editJoint(i: number) {
    setSelected(i);
    requestAnimationFrame(() =>
      document.getElementById('joint-editor')?.scrollIntoView({ block: 'start', behavior: 'smooth' }),
    );
  }

  return (
    <div className="flex flex-col gap-10 pb-4">
      <RevisionHeader page="Assembly" assembly={assembly} readOnly={!mayWrite} title="Joints & quantities">
        <p className="max-w-prose text-sm text-ink-muted">
          Sealant joints sized for the panels' thermal movement, and the sealant, tape, trim and fasteners of
          the elevation. Everything is computed in your browser as you type
          {mayWrite ? '; saving writes a new revision of the assembly.' : '.'}
        </p>
        {!mayWrite ? (
          <p className="text-sm text-ink-muted">
            {project.archivedAt
              ? 'The project is archived, so its assemblies are shown read-only.'
              : 'Your role on this project shows assemblies read-only.'}
          </p>
        ) : null}
      </RevisionHeader>

      {mayWrite ? <NewerRevisionNotice newer={editing.newerElsewhere} yours="edits" /> : null}

      <JointsSummary
        joints={shown.joints}
        evaluation={shown.jointsEval}
        takeoff={shown.takeoffEval?.result ?? null}
        problems={Object.keys(shown.jointsEval.problems).length}
        stale={stale}
      />

      <PageSection n={1} title="Joint schedule — inputs" id="joint-inputs-heading">
        {mayWrite ? (
          <div id="joint-editor" className="scroll-mt-4">
            <JointScheduleEditor
              joints={joints}
              onChange={setJoints}
              evaluation={jointsEval}
              selected={selected}
              onSelect={setSelected}
              air={air}
              onRemove={editing.history.markRemoval}
            />
          </div>
        ) : joints.length > 0 ? (
          <JointInputsTable joints={joints} />
        ) : (
          <p className="text-ink-muted">No joint schedule has been entered for this assembly.</p>
        )}
      </PageSection>

      <PageSection n={2} title="Method" id="joint-method-heading">
        <div {...staleProps(stale)}>
          <JointMethod results={shown.jointsEval.results} />
        </div>
      </PageSection>

      <ResultSection
        n={3}
        title="Schedule"
        id="joint-schedule-heading"
        stale={stale}
        note={COMPUTED_AS_YOU_TYPE}
      >
        {shown.joints.length > 0 ? (
          <ScheduleTable
            joints={shown.joints}
            evaluation={shown.jointsEval}
            onEdit={mayWrite ? editJoint : undefined}
          />
        ) : (
          <p className="text-ink-muted">No joints in the schedule yet.</p>
        )}
      </ResultSection>
      <Cautions title="Cautions — sealant joints" items={JOINT_CAUTIONS} engineVersion={ENGINE_VERSION} />

      <PageSection
        n={4}
        title="Elevation — takeoff inputs"
        id="takeoff-inputs-heading"
        aside={
          mayWrite && takeoff ? (
            <Button
              variant="quiet"
              onClick={() => {
                editing.history.markRemoval('the takeoff');
                setTakeoff(undefined);
              }}
            >
              Remove the takeoff
            </Button>
          ) : undefined
        }
      >
        {takeoff ? (
          mayWrite ? (
            <ElevationEditor input={takeoff} onChange={setTakeoff} problems={takeoffEval?.problems ?? {}} />
          ) : (
            <ElevationTable input={takeoff} />
          )
        ) : mayWrite ? (
          <div className="flex flex-wrap items-center gap-3">
            <p className="text-ink-muted">No elevation yet for the takeoff.</p>
            <Button variant="secondary" onClick={() => setTakeoff(blankTakeoff())}>
              Start a takeoff
            </Button>
          </div>
        ) : (
          <p className="text-ink-muted">No takeoff has been entered for this assembly.</p>
        )}
      </PageSection>

      <ResultSection
        n={5}
        title="Takeoff"
        id="takeoff-heading"
        stale={stale}
        note="estimates — check them against the shop drawings"
      >
        {shown.takeoff && shown.takeoffEval?.result ? (
          <TakeoffTable
            input={shown.takeoff}
            result={shown.takeoffEval.result}
            assemblyName={assembly.name}
          />
        ) : shown.takeoff && shown.takeoffEval ? (
          <TakeoffProblems problems={shown.takeoffEval.problems} input={shown.takeoff} />
        ) : (
          <p className="text-ink-muted">Nothing to take off yet.</p>
        )}
      </ResultSection>
      <Cautions title="Cautions — quantities" items={TAKEOFF_CAUTIONS} engineVersion={ENGINE_VERSION} />

      {mayWrite ? (
        <RevisionSaveBar
          editing={editing}
          words={REVISION_SAVE_WORDS.joints}
          showNewer={false}
          className="contents"
          conflictDetail={
            editing.conflict ? (
              <p>
                <strong>Carry my joints and takeoff over</strong> keeps your schedule and takeoff on top of
                revision {editing.conflict.theirs.revision} (their changes elsewhere in the assembly stay);
                nothing is saved until you save again. <strong>Load theirs</strong> replaces what is on this
                page with revision {editing.conflict.theirs.revision}.
              </p>
            ) : null
          }
          live={
            <div aria-live="polite" data-testid="joints-live-status" {...staleProps(stale, 'min-w-52')}>
              <p className="label-caps">Live</p>
              {problemCount > 0 ? (
                <p className="text-sm text-caution">
                  <span aria-hidden="true">✕ </span>
                  {problemCount === 1 ? 'One value needs attention' : `${problemCount} values need attention`}
                </p>
              ) : (
                <p className="text-sm">
                  {shown.joints.length === 0 ? (
                    'No joints'
                  ) : (
                    <>
                      <span className="text-meets">
                        <span aria-hidden="true">✓ </span>
                        {shown.jointsEval.passCount} meet
                      </span>
                      {shown.jointsEval.failCount > 0 ? (
                        <span className="text-caution">
                          {' '}
                          · <span aria-hidden="true">✕ </span>
                          {shown.jointsEval.failCount} short
                        </span>
                      ) : null}
                    </>
                  )}
                  {shown.takeoffEval?.result ? (
                    <span className="text-ink-muted">
                      {' '}
                      · {shown.takeoffEval.result.sealant.cartridges.usFlOz10_1} cartridges (10.1 US fl oz)
                    </span>
                  ) : null}
                </p>
              )}
            </div>
          }
        />
      ) : null}
    </div>
  );
}
