import { can } from '@shared/auth/permissions';
import type { JointInput } from '@shared/calc/joints/schema';
import type { TakeoffInput } from '@shared/calc/takeoff/schema';
import { ENGINE_VERSION } from '@shared/calc/trace';
import { type Assembly, type AssemblyInput, assemblyInputSchema } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useState } from 'react';
import { useBlocker, useParams } from 'react-router';
import { Button } from '../../components/ui/Button';
import { Field } from '../../components/ui/Field';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { SheetSection } from '../../components/ui/SheetSection';
import { TextInput } from '../../components/ui/TextInput';
import { useAssembly } from '../../features/assemblies/api/get-assembly';
import { conflictingAssembly, useUpdateAssembly } from '../../features/assemblies/api/update-assembly';
import { JointCautions } from '../../features/joints/components/JointCautions';
import { JointInputsTable } from '../../features/joints/components/JointInputsTable';
import { JointMethod } from '../../features/joints/components/JointMethod';
import { JointScheduleEditor } from '../../features/joints/components/JointScheduleEditor';
import { ScheduleTable } from '../../features/joints/components/ScheduleTable';
import { evaluateJoints } from '../../features/joints/evaluate';
import { useProject } from '../../features/projects/api/get-project';
import { ElevationEditor } from '../../features/takeoff/components/ElevationEditor';
import { ElevationTable } from '../../features/takeoff/components/ElevationTable';
import { TakeoffCautions } from '../../features/takeoff/components/TakeoffCautions';
import { TakeoffProblems } from '../../features/takeoff/components/TakeoffProblems';
import { TakeoffTable } from '../../features/takeoff/components/TakeoffTable';
import { blankTakeoff } from '../../features/takeoff/draft';
import { evaluateTakeoff } from '../../features/takeoff/evaluate';
import { errorMessage, isApiRequestError } from '../../lib/api';
import { formatDateTime } from '../../lib/format';
import { assemblyKeys } from '../../lib/query-keys';
import { AssemblyTabs } from '../layout/AssemblyTabs';

/** The joints & quantities sheet of one assembly: joint schedule and takeoff, computed in the browser. */
export function AssemblyJointsPage() {
  const { id = '', assemblyId = '' } = useParams();
  const { data: project } = useProject(id);
  const assembly = useAssembly(assemblyId);

  if (!project) return null;
  if (assembly.isPending) return <Loading what="Loading the assembly" />;
  if (assembly.isError) return <Notice tone="caution" title={errorMessage(assembly.error)} live />;
  const a = assembly.data;
  if (a.projectId !== project.id)
    return <Notice tone="caution" title="This assembly belongs to another project." />;

  return (
    <div className="flex flex-col gap-10">
      <title>{`Joints & quantities · ${a.name} · Skinwright`}</title>
      <AssemblyTabs projectId={project.id} assemblyId={a.id} name={a.name} />
      <JointsSheet key={a.id} project={project} assembly={a} />
    </div>
  );
}

const same = (x: unknown, y: unknown) => JSON.stringify(x) === JSON.stringify(y);

function JointsSheet({ project, assembly }: { project: Project; assembly: Assembly }) {
  const qc = useQueryClient();
  const update = useUpdateAssembly();
  const mayWrite = can(project.myRole, 'assembly.write') && project.archivedAt === null;

  const [base, setBase] = useState({ version: assembly.version, input: assembly.current.input });
  const [joints, setJoints] = useState<JointInput[]>(assembly.current.input.joints ?? []);
  const [takeoff, setTakeoff] = useState<TakeoffInput | undefined>(assembly.current.input.takeoff);
  const [selected, setSelected] = useState(0);
  const [note, setNote] = useState('');
  const [saveProblem, setSaveProblem] = useState<string[] | null>(null);
  const [savedAs, setSavedAs] = useState<number | null>(null);
  const [conflict, setConflict] = useState<Assembly | null>(null);
  const saving = useRef(false);
  const leaving = useRef(false);

  const jointsEval = useMemo(() => evaluateJoints(joints), [joints]);
  const takeoffEval = useMemo(() => (takeoff ? evaluateTakeoff(takeoff) : null), [takeoff]);
  const problemCount =
    Object.keys(jointsEval.problems).length + Object.keys(takeoffEval?.problems ?? {}).length;

  const edited = !same(joints, base.input.joints ?? []) || !same(takeoff, base.input.takeoff);
  const dirty = edited || note.trim() !== '';
  const air = { min: project.winterDesignTempC, max: project.summerDesignTempC };

  // Someone saved while this page was open: take their revision if nothing here has been edited.
  useEffect(() => {
    if (conflict || saving.current || assembly.version <= base.version || dirty) return;
    setBase({ version: assembly.version, input: assembly.current.input });
    setJoints(assembly.current.input.joints ?? []);
    setTakeoff(assembly.current.input.takeoff);
  }, [assembly, base.version, conflict, dirty]);
  const newerElsewhere = !conflict && assembly.version > base.version ? assembly : null;

  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      mayWrite && dirty && !leaving.current && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (!mayWrite || !dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [mayWrite, dirty]);

  function adopt(a: Assembly) {
    setBase({ version: a.version, input: a.current.input });
    setJoints(a.current.input.joints ?? []);
    setTakeoff(a.current.input.takeoff);
    setSelected(0);
  }

  async function save() {
    setSaveProblem(null);
    setSavedAs(null);
    if (problemCount > 0) {
      setSaveProblem(['Some values cannot be used yet: put right the values marked ✕ first.']);
      return;
    }
    const { joints: _j, takeoff: _t, ...rest } = base.input;
    const input: AssemblyInput = {
      ...rest,
      ...(joints.length > 0 ? { joints } : {}),
      ...(takeoff ? { takeoff } : {}),
    };
    const parsed = assemblyInputSchema.safeParse(input);
    if (!parsed.success) {
      setSaveProblem([
        'The assembly would not be accepted:',
        ...parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`),
      ]);
      return;
    }
    saving.current = true;
    try {
      const saved = await update.mutateAsync({
        assemblyId: assembly.id,
        version: base.version,
        note: note.trim(),
        input: parsed.data,
      });
      adopt(saved);
      setSelected(selected);
      setNote('');
      setSavedAs(saved.revision);
    } catch (e) {
      const theirs = conflictingAssembly(e);
      if (theirs) {
        setConflict(theirs);
        return;
      }
      if (isApiRequestError(e) && e.fields)
        setSaveProblem([
          'The server did not accept some values:',
          ...Object.entries(e.fields).map(([k, v]) => `${k}: ${v}`),
        ]);
      else setSaveProblem([errorMessage(e)]);
    } finally {
      saving.current = false;
    }
  }

  function editJoint(i: number) {
    setSelected(i);
    requestAnimationFrame(() =>
      document.getElementById('joint-editor')?.scrollIntoView({ block: 'start', behavior: 'smooth' }),
    );
  }

  const revisionLine = `Assembly · revision ${assembly.revision} saved ${formatDateTime(assembly.current.createdAt)}${assembly.current.createdBy ? ` by ${assembly.current.createdBy}` : ''}${mayWrite ? '' : ' · read-only'}`;

  return (
    <div className="flex flex-col gap-10 pb-4">
      <header className="flex flex-col gap-1">
        <p className="label-caps">{revisionLine}</p>
        <h2 className="text-3xl">Joints &amp; quantities</h2>
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
      </header>

      {newerElsewhere && mayWrite && dirty ? (
        <Notice
          tone="warning"
          title={`Revision ${newerElsewhere.revision} was saved by someone else while you were editing.`}
        >
          <p>
            Your edits are kept. When you save, you will be asked whether to carry them over or load theirs.
          </p>
        </Notice>
      ) : null}

      <SheetSection n={1} title="Joint schedule — inputs" id="joint-inputs-heading">
        {mayWrite ? (
          <div id="joint-editor" className="scroll-mt-4">
            <JointScheduleEditor
              joints={joints}
              onChange={setJoints}
              evaluation={jointsEval}
              selected={selected}
              onSelect={setSelected}
              air={air}
            />
          </div>
        ) : joints.length > 0 ? (
          <JointInputsTable joints={joints} />
        ) : (
          <p className="text-ink-muted">No joint schedule has been entered for this assembly.</p>
        )}
      </SheetSection>

      <SheetSection n={2} title="Method" id="joint-method-heading">
        <JointMethod results={jointsEval.results} />
      </SheetSection>

      <SheetSection
        n={3}
        title="Schedule"
        id="joint-schedule-heading"
        aside={<span className="text-xs text-ink-muted">computed in your browser as you type</span>}
      >
        <div aria-live="polite">
          {joints.length > 0 ? (
            <ScheduleTable
              joints={joints}
              evaluation={jointsEval}
              onEdit={mayWrite ? editJoint : undefined}
            />
          ) : (
            <p className="text-ink-muted">No joints in the schedule yet.</p>
          )}
        </div>
      </SheetSection>
      <JointCautions engineVersion={ENGINE_VERSION} />

      <SheetSection
        n={4}
        title="Elevation — takeoff inputs"
        id="takeoff-inputs-heading"
        aside={
          mayWrite && takeoff ? (
            <Button variant="quiet" onClick={() => setTakeoff(undefined)}>
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
      </SheetSection>

      <SheetSection
        n={5}
        title="Takeoff"
        id="takeoff-heading"
        aside={<span className="text-xs text-ink-muted">estimates — verify against shop drawings</span>}
      >
        <div aria-live="polite">
          {takeoff && takeoffEval?.result ? (
            <TakeoffTable input={takeoff} result={takeoffEval.result} assemblyName={assembly.name} />
          ) : takeoff && takeoffEval ? (
            <TakeoffProblems problems={takeoffEval.problems} input={takeoff} />
          ) : (
            <p className="text-ink-muted">Nothing to take off yet.</p>
          )}
        </div>
      </SheetSection>
      <TakeoffCautions engineVersion={ENGINE_VERSION} />

      {conflict ? (
        <Notice tone="warning" title="Someone else saved this assembly first." live>
          <p>
            Revision <span className="num">{conflict.revision}</span> was saved
            {conflict.current.createdBy ? ` by ${conflict.current.createdBy}` : ''} at{' '}
            <span className="num">{formatDateTime(conflict.current.createdAt)}</span>
            {conflict.current.note ? ` (“${conflict.current.note}”)` : ''} while you were editing revision{' '}
            <span className="num">{base.version}</span>. Nothing of yours has been saved, and your edits are
            still on this page.
          </p>
          <p>
            <strong>Carry my joints and takeoff over</strong> keeps your schedule and takeoff on top of
            revision {conflict.revision} (their changes elsewhere in the assembly stay); nothing is saved
            until you save again. <strong>Load theirs</strong> replaces what is on this page with revision{' '}
            {conflict.revision}.
          </p>
          <div className="flex flex-wrap gap-3 pt-1">
            <Button
              variant="secondary"
              onClick={() => {
                setBase({ version: conflict.version, input: conflict.current.input });
                setConflict(null);
              }}
            >
              Carry my joints and takeoff over
            </Button>
            <Button
              variant="secondary"
              onClick={() => {
                qc.setQueryData(assemblyKeys.detail(conflict.id), conflict);
                void qc.invalidateQueries({ queryKey: assemblyKeys.revisions(conflict.id) });
                adopt(conflict);
                setConflict(null);
                setNote('');
              }}
            >
              Load theirs (discard my edits)
            </Button>
          </div>
        </Notice>
      ) : null}

      {blocker.state === 'blocked' ? (
        <Notice tone="warning" title="The joints and takeoff have edits that are not saved." live>
          <div className="flex flex-wrap gap-3 pt-1">
            <Button variant="secondary" onClick={() => blocker.reset?.()}>
              Stay and keep editing
            </Button>
            <Button
              variant="danger"
              onClick={() => {
                leaving.current = true;
                blocker.proceed?.();
              }}
            >
              Leave without saving
            </Button>
          </div>
        </Notice>
      ) : null}

      {saveProblem ? (
        <Notice tone="caution" title="Not saved." live>
          {saveProblem.map((m) => (
            <p key={m}>{m}</p>
          ))}
        </Notice>
      ) : null}

      {mayWrite ? (
        <div className="sticky bottom-0 z-10 -mx-4 border-t-2 border-ink bg-paper px-4 py-3 sm:-mx-6 sm:px-6">
          <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
            <div className="min-w-52" aria-live="polite" data-testid="joints-live-status">
              <p className="label-caps">Live</p>
              {problemCount > 0 ? (
                <p className="text-sm text-caution">
                  <span aria-hidden="true">✕ </span>
                  {problemCount === 1 ? 'One value needs attention' : `${problemCount} values need attention`}
                </p>
              ) : (
                <p className="text-sm">
                  {joints.length === 0 ? (
                    'No joints'
                  ) : (
                    <>
                      <span className="text-meets">
                        <span aria-hidden="true">✓ </span>
                        {jointsEval.passCount} meet
                      </span>
                      {jointsEval.failCount > 0 ? (
                        <span className="text-caution">
                          {' '}
                          · <span aria-hidden="true">✕ </span>
                          {jointsEval.failCount} short
                        </span>
                      ) : null}
                    </>
                  )}
                  {takeoffEval?.result ? (
                    <span className="text-ink-muted">
                      {' '}
                      · {takeoffEval.result.sealant.cartridges.usFlOz10_1} cartridges (10.1 US fl oz)
                    </span>
                  ) : null}
                </p>
              )}
            </div>
            <Field
              label="Revision note"
              hint="What changed, and why (kept with the revision)."
              className="min-w-64 flex-1"
            >
              {(c) => (
                <TextInput
                  {...c}
                  value={note}
                  maxLength={500}
                  onChange={(e) => setNote(e.target.value)}
                  placeholder="e.g. VJ-1 widened to 25 mm after the maker's review"
                  className="py-1.5 text-sm"
                />
              )}
            </Field>
            <div className="flex flex-col items-end gap-1">
              <Button
                variant="primary"
                busy={update.isPending}
                busyLabel="Saving…"
                disabled={conflict !== null || !edited}
                onClick={() => void save()}
              >
                Save as revision {base.version + 1}
              </Button>
              {savedAs !== null && !dirty ? (
                <p role="status" className="text-xs">
                  <span aria-hidden="true">✓ </span>Saved as revision {savedAs}.
                </p>
              ) : !dirty ? (
                <p className="text-xs text-ink-muted">No changes to save.</p>
              ) : null}
            </div>
          </div>
        </div>
      ) : null}
    </div>
  );
}
