import type { ProjectForChecks } from '@shared/checks/inputs';
import { generateChecklist } from '@shared/inspections/generate';
import {
  DEFICIENCY_TRANSITIONS,
  type Deficiency,
  type DeficiencyTransition,
  type Inspection,
  type InspectionArea,
  type InspectionCreate,
  ITEM_STATE_TEXT,
  type ItemAnswer,
  type ItemAnswerResult,
  type TemplateItem,
} from '@shared/inspections/schema';
import { answerProblem, checkMeasured } from '@shared/inspections/tolerance';
import { type AssemblyInput, assemblyInputSchema } from '@shared/schemas/assembly';
import type { CheckRunInputs } from '@shared/schemas/check-runs';
import type { Project } from '@shared/schemas/project';
import { verificationCode } from '@shared/sheets/verification';
import { and, asc, desc, eq, gte, isNull, max, ne, sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import {
  assemblies,
  assemblyRevisions,
  checkRuns,
  inspectionDeficiencies,
  inspectionItems,
  inspectionPhotos,
  inspections,
  inspectionTemplates,
  projectMembers,
  projects,
} from '../../db/schema';
import type { AuditRecord } from '../audit';
import { recordAudit } from '../audit';
import { conflict, DomainError } from '../errors';
import { STALE, versionedUpdate } from '../versioned';
import { CREW_ROLES, INSPECTOR_ROLES, type InspectionNotifications } from './notifications';
import { type Actor, closedError, type InspectionQueries, type InspectionRow } from './queries';

const invalid = (field: string, reason: string) =>
  new DomainError('invalid', 'invalid_input', `${field}: ${reason}`, { [field]: reason });

const AREA_WORDS: Record<string, string> = { field: 'field', edge: 'edge', corner: 'corner' };
const areaWords = (a: InspectionArea) =>
  a.kind === 'grid' ? `grid ${a.from}–${a.to}` : `${AREA_WORDS[a.zone]} zone`;

const STALE_ITEM = 'someone answered this item after you opened it; here it is as it is now';
const STALE_DEFICIENCY = 'someone changed this deficiency after you opened it; here it is as it is now';
const STALE_INSPECTION = 'someone changed this inspection after you opened it; here it is as it is now';

/** The project data the checks read, from the project as it is now. */
const projectForChecks = (p: Project): ProjectForChecks => p;

/**
 * The workflow of inspections: generate one from an assembly revision, answer its items (each under its own
 * version; a failed item opens a deficiency), close it, and take its deficiencies through their states. Every
 * change writes the audit log (entity `inspection`) in its transaction and e-mails the people concerned after it.
 */
export function createInspectionWorkflow(
  db: Db,
  q: InspectionQueries,
  notify: InspectionNotifications,
  /** Issues a check run's sheet code (the sheet service; the demo seed cites no run). */
  sheets: { issue(runId: string): Promise<unknown> },
) {
  const audit = (r: Pick<InspectionRow, 'id' | 'projectId'>, actor: Actor, action: string, after: unknown) =>
    ({
      actorId: actor.id,
      projectId: r.projectId,
      entity: 'inspection',
      entityId: r.id,
      action,
      after,
    }) satisfies AuditRecord;

  /** The crew member a deficiency goes to by default: the project's first cladding subcontractor. */
  async function defaultOwner(tx: Db, projectId: string): Promise<string | null> {
    const [m] = await tx
      .select({ id: projectMembers.userId })
      .from(projectMembers)
      .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.role, 'subcontractor')))
      .orderBy(asc(projectMembers.createdAt))
      .limit(1);
    return m?.id ?? null;
  }

  async function openDeficiency(tx: Db, r: InspectionRow, itemId: string, description: string, actor: Actor) {
    const [has] = await tx
      .select({ id: inspectionDeficiencies.id })
      .from(inspectionDeficiencies)
      .where(and(eq(inspectionDeficiencies.itemId, itemId), ne(inspectionDeficiencies.state, 'accepted')));
    if (has) return null;
    // Numbers follow on within the inspection; the inspection's row is locked so racing failures take turns.
    await tx.select({ id: inspections.id }).from(inspections).where(eq(inspections.id, r.id)).for('update');
    const [{ last } = { last: null }] = await tx
      .select({ last: max(inspectionDeficiencies.number) })
      .from(inspectionDeficiencies)
      .where(eq(inspectionDeficiencies.inspectionId, r.id));
    const [d] = await tx
      .insert(inspectionDeficiencies)
      .values({
        inspectionId: r.id,
        itemId,
        number: (last ?? 0) + 1,
        description,
        ownerId: await defaultOwner(tx, r.projectId),
        createdBy: actor.id,
      })
      .returning();
    return d!;
  }

  /** The deficiency's inspection, for a step that must also find the deficiency in a given state. */
  async function deficiencyRow(id: string) {
    const [d] = await db.select().from(inspectionDeficiencies).where(eq(inspectionDeficiencies.id, id));
    if (!d) throw new DomainError('not_found', 'not_found', 'deficiency not found');
    return { d, r: await q.row(d.inspectionId) };
  }

  /** One transition of a deficiency under its version, audited, with the e-mail after it. */
  async function transition(
    id: string,
    actor: Actor,
    step: DeficiencyTransition,
    body: { version: number; note: string; photoId?: string },
  ): Promise<Deficiency> {
    const { d, r } = await deficiencyRow(id);
    const rule = DEFICIENCY_TRANSITIONS[step];
    if (!(rule.from as readonly string[]).includes(d.state))
      throw conflict(
        'wrong_state',
        `deficiency ${d.number} is ${d.state}; “${step}” needs it to be ${rule.from.join(' or ')}`,
        await q.deficiency(id),
      );
    if (step === 'correct') {
      const [photo] = await db
        .select({ id: inspectionPhotos.id })
        .from(inspectionPhotos)
        .where(
          and(
            eq(inspectionPhotos.id, body.photoId!),
            eq(inspectionPhotos.itemId, d.itemId),
            gte(inspectionPhotos.createdAt, d.createdAt),
          ),
        );
      if (!photo)
        throw invalid(
          'photoId',
          'a photo of this item taken after the deficiency was opened shows the correction',
        );
    }
    return versionedUpdate(db, {
      conflictMessage: STALE_DEFICIENCY,
      current: () => q.deficiency(id),
      write: async (tx) => {
        const [u] = await tx
          .update(inspectionDeficiencies)
          .set({
            state: rule.to,
            note: body.note,
            ...(step === 'correct' ? { correctionPhotoId: body.photoId! } : {}),
            version: sql`${inspectionDeficiencies.version} + 1`,
            updatedAt: new Date(),
          })
          .where(and(eq(inspectionDeficiencies.id, id), eq(inspectionDeficiencies.version, body.version)))
          .returning({ id: inspectionDeficiencies.id });
        if (!u) return STALE;
        return {
          audit: [
            audit(r, actor, `deficiency_${step}`, {
              deficiency: d.number,
              from: d.state,
              to: rule.to,
              note: body.note,
            }),
          ],
        };
      },
      answer: async () => {
        const now = await q.deficiency(id);
        const to = step === 'correct' ? { ids: [r.createdBy], roles: INSPECTOR_ROLES } : { ids: [d.ownerId] };
        await notify.send(
          r,
          actor,
          to,
          `deficiency ${d.number} ${rule.to}`,
          [`${actor.name} marked deficiency ${d.number} (${now.itemLabel}) ${rule.to}.`, body.note].filter(
            Boolean,
          ),
        );
        return now;
      },
    });
  }

  return {
    /** Generates an inspection of an assembly revision of the project over the scope, with the firm's items. */
    async create(project: Project, actor: Actor, body: InspectionCreate): Promise<Inspection> {
      const [a] = await db
        .select()
        .from(assemblies)
        .where(and(eq(assemblies.id, body.assemblyId), eq(assemblies.projectId, project.id)));
      if (!a) throw invalid('assemblyId', 'no such assembly on this project');
      const revision = body.revision ?? a.currentRevision;
      const [rev] = await db
        .select()
        .from(assemblyRevisions)
        .where(and(eq(assemblyRevisions.assemblyId, a.id), eq(assemblyRevisions.revision, revision)));
      if (!rev) throw invalid('revision', `the assembly has no revision ${revision}`);
      const parsed = assemblyInputSchema.safeParse(rev.input);
      const input: AssemblyInput = parsed.success ? parsed.data : (rev.input as AssemblyInput);
      // The latest check run of this revision proved it: its snapshot of the project is what the items cite.
      const [run] = await db
        .select({ id: checkRuns.id, hash: checkRuns.hash, inputs: checkRuns.inputs })
        .from(checkRuns)
        .where(and(eq(checkRuns.assemblyId, a.id), eq(checkRuns.assemblyRevision, revision)))
        .orderBy(desc(checkRuns.createdAt))
        .limit(1);
      if (run) await sheets.issue(run.id);
      const [template] = await db
        .select()
        .from(inspectionTemplates)
        .where(eq(inspectionTemplates.organisationId, project.organisationId))
        .orderBy(desc(inspectionTemplates.version))
        .limit(1);
      const checkRun = run ? { id: run.id, sheetCode: verificationCode(run.hash) } : null;
      const scope = { assemblyId: a.id, revision, elevation: body.elevation, area: body.area };
      const items = generateChecklist({
        assembly: { id: a.id, revision, input },
        project: run
          ? ((run.inputs as CheckRunInputs).project as ProjectForChecks)
          : projectForChecks(project),
        scope,
        checkRun,
        template: template ? { version: template.version, items: template.items as TemplateItem[] } : null,
      });
      const id = await db.transaction(async (tx) => {
        // Numbers follow on within the project: its row is locked so racing creations take turns.
        await tx.select({ id: projects.id }).from(projects).where(eq(projects.id, project.id)).for('update');
        const [{ last } = { last: null }] = await tx
          .select({ last: max(inspections.number) })
          .from(inspections)
          .where(eq(inspections.projectId, project.id));
        if (template && !template.frozenAt)
          await tx
            .update(inspectionTemplates)
            .set({ frozenAt: new Date() })
            .where(and(eq(inspectionTemplates.id, template.id), isNull(inspectionTemplates.frozenAt)));
        const [r] = await tx
          .insert(inspections)
          .values({
            projectId: project.id,
            number: (last ?? 0) + 1,
            title: body.title || `${body.elevation} — ${areaWords(body.area)}`,
            assemblyId: a.id,
            assemblyRevision: revision,
            assemblyName: a.name,
            elevation: body.elevation,
            area: body.area,
            checkRunId: checkRun?.id ?? null,
            sheetCode: checkRun?.sheetCode ?? null,
            templateId: template?.id ?? null,
            createdBy: actor.id,
          })
          .returning();
        if (items.length > 0)
          await tx.insert(inspectionItems).values(
            items.map((it, position) => ({
              inspectionId: r!.id,
              position,
              kind: it.kind,
              itemGroup: it.group,
              label: it.label,
              designText: it.designText,
              quantity: it.quantity,
              designValue: it.designValue,
              tolerance: it.tolerance,
              source: it.source,
            })),
          );
        await recordAudit(
          tx,
          audit(r!, actor, 'create', {
            number: r!.number,
            assembly: a.name,
            revision,
            elevation: body.elevation,
            area: body.area,
            items: items.length,
            checkRun: checkRun?.id ?? null,
            templateVersion: template?.version ?? null,
          }),
        );
        return r!;
      });
      await notify.send(id, actor, { roles: [...CREW_ROLES, ...INSPECTOR_ROLES] }, 'new inspection', [
        `${actor.name} started inspection ${id.number} of ${body.elevation} (${areaWords(body.area)}), ${items.length} items.`,
      ]);
      return q.get(id.id);
    },

    /**
     * Answers an item under the version the caller read (409 with the item as it is now when stale). A measured
     * value outside the tolerance cannot pass; a failed item opens a deficiency (unless one is open already).
     */
    async answer(itemId: string, actor: Actor, body: ItemAnswer): Promise<ItemAnswerResult> {
      const [item] = await db.select().from(inspectionItems).where(eq(inspectionItems.id, itemId));
      if (!item) throw new DomainError('not_found', 'not_found', 'item not found');
      const r = await q.row(item.inspectionId);
      if (r.status === 'closed') throw closedError(r);
      const measured = body.measured === undefined ? item.measured : body.measured;
      const tolerance = item.tolerance as Parameters<typeof checkMeasured>[0]['tolerance'];
      const problem = answerProblem(
        { quantity: item.quantity as never, tolerance },
        { state: body.state, measured },
      );
      if (problem) throw invalid(problem.field, problem.reason);
      const note = body.note ?? item.note;
      let opened: string | null = null;
      const result = await versionedUpdate(db, {
        conflictMessage: STALE_ITEM,
        current: () => q.item(itemId),
        write: async (tx) => {
          const [u] = await tx
            .update(inspectionItems)
            .set({
              state: body.state,
              measured,
              note,
              location: body.location ?? item.location,
              version: sql`${inspectionItems.version} + 1`,
              answeredBy: actor.id,
              answeredAt: new Date(),
            })
            .where(and(eq(inspectionItems.id, itemId), eq(inspectionItems.version, body.version)))
            .returning({ id: inspectionItems.id });
          if (!u) return STALE;
          const entries: AuditRecord[] = [
            audit(r, actor, 'answer', {
              item: item.label,
              state: body.state,
              measured,
              check: checkMeasured({ tolerance }, measured).status,
            }),
          ];
          if (body.state === 'fail') {
            const d = await openDeficiency(
              tx,
              r,
              itemId,
              note || `${item.label}: ${checkMeasured({ tolerance }, measured).text}`,
              actor,
            );
            if (d) {
              opened = d.id;
              entries.push(audit(r, actor, 'deficiency_open', { deficiency: d.number, item: item.label }));
            }
          }
          return { audit: entries };
        },
        answer: async () => {
          const openedDeficiency = opened ? await q.deficiency(opened) : null;
          if (openedDeficiency)
            await notify.send(
              r,
              actor,
              { ids: [openedDeficiency.ownerId], roles: openedDeficiency.ownerId ? [] : CREW_ROLES },
              `deficiency ${openedDeficiency.number} opened`,
              [
                `${actor.name} failed “${item.label}”: ${openedDeficiency.description}`,
                openedDeficiency.dueDate ? `Due: ${openedDeficiency.dueDate}.` : '',
              ].filter(Boolean),
            );
          return { item: await q.item(itemId), openedDeficiency };
        },
      });
      return result;
    },

    /** Closes the inspection once every item has a state; the answer lists the deficiencies still open. */
    async close(id: string, actor: Actor, version: number) {
      const r = await q.row(id);
      if (r.status === 'closed') throw closedError(r);
      const [{ n } = { n: 0 }] = await db
        .select({ n: sql<number>`count(*)::int` })
        .from(inspectionItems)
        .where(and(eq(inspectionItems.inspectionId, id), eq(inspectionItems.state, 'unseen')));
      if (Number(n) > 0)
        throw new DomainError(
          'invalid',
          'items_unseen',
          `${n} item${Number(n) === 1 ? ' is' : 's are'} not yet seen: give every item a state (${ITEM_STATE_TEXT.na.label.toLowerCase()} where it does not apply) before closing`,
          { items: `${n} not yet seen` },
        );
      return versionedUpdate(db, {
        conflictMessage: STALE_INSPECTION,
        current: () => q.get(id),
        write: async (tx) => {
          const [u] = await tx
            .update(inspections)
            .set({
              status: 'closed',
              closedAt: new Date(),
              closedBy: actor.id,
              version: sql`${inspections.version} + 1`,
              updatedAt: new Date(),
            })
            .where(
              and(
                eq(inspections.id, id),
                eq(inspections.version, version),
                eq(inspections.status, 'in_progress'),
              ),
            )
            .returning({ id: inspections.id });
          if (!u) return STALE;
          return { audit: [audit(r, actor, 'close', { number: r.number })] };
        },
        answer: async () => {
          const [inspection, openDeficiencies] = await Promise.all([q.get(id), q.openDeficiencies(id)]);
          await notify.send(
            r,
            actor,
            { ids: [r.createdBy, ...openDeficiencies.map((d) => d.ownerId)], roles: INSPECTOR_ROLES },
            'closed',
            [
              `${actor.name} closed inspection ${r.number}.`,
              openDeficiencies.length === 0
                ? 'No deficiency is open.'
                : `Open deficiencies:\n${openDeficiencies.map((d) => `${d.number}. ${d.itemLabel} — ${d.state}${d.dueDate ? `, due ${d.dueDate}` : ''}`).join('\n')}`,
            ],
          );
          return { inspection, openDeficiencies };
        },
      });
    },

    /** Owner, due date and description of a deficiency, under its version; the new owner is told. */
    async updateDeficiency(
      id: string,
      actor: Actor,
      body: { version: number; ownerId?: string | null; dueDate?: string | null; description?: string },
    ): Promise<Deficiency> {
      const { d, r } = await deficiencyRow(id);
      if (body.ownerId) {
        const [m] = await db
          .select({ id: projectMembers.userId })
          .from(projectMembers)
          .where(and(eq(projectMembers.projectId, r.projectId), eq(projectMembers.userId, body.ownerId)));
        if (!m) throw invalid('ownerId', 'the owner must be a member of the project');
      }
      const changes = {
        ...(body.ownerId === undefined ? {} : { ownerId: body.ownerId }),
        ...(body.dueDate === undefined ? {} : { dueDate: body.dueDate }),
        ...(body.description === undefined ? {} : { description: body.description }),
      };
      return versionedUpdate(db, {
        conflictMessage: STALE_DEFICIENCY,
        current: () => q.deficiency(id),
        write: async (tx) => {
          const [u] = await tx
            .update(inspectionDeficiencies)
            .set({ ...changes, version: sql`${inspectionDeficiencies.version} + 1`, updatedAt: new Date() })
            .where(and(eq(inspectionDeficiencies.id, id), eq(inspectionDeficiencies.version, body.version)))
            .returning({ id: inspectionDeficiencies.id });
          if (!u) return STALE;
          return {
            audit: [
              {
                ...audit(r, actor, 'deficiency_update', { deficiency: d.number, ...changes }),
                before: { ownerId: d.ownerId, dueDate: d.dueDate, description: d.description },
              },
            ],
          };
        },
        answer: async () => {
          const now = await q.deficiency(id);
          if (body.ownerId && body.ownerId !== d.ownerId)
            await notify.send(
              r,
              actor,
              { ids: [body.ownerId] },
              `deficiency ${d.number} is yours`,
              [
                `${actor.name} made you the owner of deficiency ${d.number} (${now.itemLabel}).`,
                now.dueDate ? `Due: ${now.dueDate}.` : '',
              ].filter(Boolean),
            );
          return now;
        },
      });
    },

    correct: (id: string, actor: Actor, body: { version: number; photoId: string; note: string }) =>
      transition(id, actor, 'correct', body),
    accept: (id: string, actor: Actor, body: { version: number; note: string }) =>
      transition(id, actor, 'accept', body),
    reopen: (id: string, actor: Actor, body: { version: number; note: string }) =>
      transition(id, actor, 'reopen', body),
  };
}
