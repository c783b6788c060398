import { firmRoleSchema, projectRoleSchema } from '@shared/auth/permissions';
import { assemblyInputSchema } from '@shared/schemas/assembly';
import { attachmentProductInputSchema } from '@shared/schemas/attachment-library';
import { criteriaSetCreateSchema } from '@shared/schemas/criteria';
import { projectClimateSchema, projectInputSchema, projectWindSchema } from '@shared/schemas/project';
import { eq, inArray, sql } from 'drizzle-orm';
import { z } from 'zod';
import demo from '../../data/seed/demo.json' with { type: 'json' };
import demoAssembly from '../../data/seed/demo-assembly.json' with { type: 'json' };
import demoAttachmentLibrary from '../../data/seed/demo-attachment-library.json' with { type: 'json' };
import demoCriteria from '../../data/seed/demo-criteria.json' with { type: 'json' };
import demoPanelAssembly from '../../data/seed/demo-panel-assembly.json' with { type: 'json' };
import type { Auth } from '../auth/auth';
import { createAssemblyService } from '../services/assemblies';
import { createCriteriaService } from '../services/criteria';
import { seedDemoInspection } from '../services/inspections/demo';
import { attachmentProductRow } from '../services/library';
import { createProjectService } from '../services/projects';
import { type Db, noReadCache } from './client';
import {
  orgAttachmentProducts,
  organisationMembers,
  organisations,
  projectMembers,
  projects as projectTable,
  user,
} from './schema';

const demoSchema = z.object({
  password: z.string().min(10),
  /** `verified`: the demo site administrator has verified the firm (its sheets say so). */
  firms: z.array(z.object({ key: z.string(), name: z.string(), verified: z.boolean().default(false) })),
  users: z.array(
    z.object({
      email: z.email(),
      name: z.string(),
      firm: z.string(),
      firmRole: firmRoleSchema,
      siteRole: z.enum(['admin', 'user']).optional(),
      /** What the account is for in the demo (its role on the demo project). */
      demoRole: z.string(),
    }),
  ),
  projects: z.array(
    projectInputSchema.and(
      z.object({
        owner: z.email(),
        members: z.array(z.object({ email: z.email(), role: projectRoleSchema })),
      }),
    ),
  ),
});
export const demoScenario = demoSchema.parse(demo);
/** The demo project's wind data, monthly climate and first assembly (invented). */
const demoContent = z
  .object({ assembly: assemblyInputSchema, wind: projectWindSchema, climate: projectClimateSchema })
  .parse(demoAssembly);
/** The demo project's second assembly: an insulated metal panel wall (invented). */
const demoPanel = z.object({ assembly: assemblyInputSchema }).parse(demoPanelAssembly).assembly;
/** The demo firm's illustrative code table (invented values, titled as such). */
const demoCodeTable = z
  .object({ firm: z.string(), createdBy: z.email(), set: criteriaSetCreateSchema })
  .parse(demoCriteria);

/** The engineer's firm's panel tables and clips (invented, named as such). */
const demoLibrary = z
  .object({ firm: z.string(), createdBy: z.email(), products: z.array(attachmentProductInputSchema) })
  .parse(demoAttachmentLibrary);

/** The demo sign-in accounts, as `npm start` prints them and the README lists them. */
export const demoAccounts = demoScenario.users.map((u) => ({
  email: u.email,
  password: demoScenario.password,
  role: u.demoRole,
}));

/** Seeds the invented demo scenario once; running it again changes nothing. */
export async function seedDemo(db: Db, auth: Auth): Promise<boolean> {
  const first = demoScenario.users[0]!;
  const [exists] = await db.select({ id: user.id }).from(user).where(eq(user.email, first.email));
  if (exists) return false;

  const firmIds = new Map<string, string>();
  for (const f of demoScenario.firms) {
    const [row] = await db
      .insert(organisations)
      .values({ name: f.name, slug: `demo-${f.key}` })
      .returning({ id: organisations.id });
    firmIds.set(f.key, row!.id);
  }
  const userIds = new Map<string, string>();
  // Accounts made as a confirmed sign-up would make them (better-auth's own records), without its e-mails.
  const { internalAdapter, password } = await auth.$context;
  const hash = await password.hash(demoScenario.password);
  for (const u of demoScenario.users) {
    const created = await internalAdapter.createUser(
      {
        name: u.name,
        email: u.email,
        emailVerified: true,
        role: u.siteRole ?? 'user',
      },
      { method: 'email-password' },
    );
    await internalAdapter.linkAccount({
      userId: created.id,
      providerId: 'credential',
      accountId: created.id,
      password: hash,
    });
    userIds.set(u.email, created.id);
    await db
      .insert(organisationMembers)
      .values({ organisationId: firmIds.get(u.firm)!, userId: created.id, role: u.firmRole });
  }
  const siteAdmin = demoScenario.users.find((u) => u.siteRole === 'admin');
  const verified = demoScenario.firms.filter((f) => f.verified).map((f) => firmIds.get(f.key)!);
  if (siteAdmin && verified.length > 0)
    await db
      .update(organisations)
      .set({ verifiedAt: sql`now()`, verifiedBy: userIds.get(siteAdmin.email)! })
      .where(inArray(organisations.id, verified));
  const projects = createProjectService(db, noReadCache);
  const assemblies = createAssemblyService(db, noReadCache);
  for (const [index, { owner, members, ...input }] of demoScenario.projects.entries()) {
    const created = await projects.create(userIds.get(owner)!, input);
    for (const m of members)
      await db
        .insert(projectMembers)
        .values({ projectId: created.id, userId: userIds.get(m.email)!, role: m.role });
    if (index > 0) continue;
    // The demo project carries wind data, a monthly climate, one assembly with every module's data and an
    // insulated metal panel wall.
    await db
      .update(projectTable)
      .set({ wind: demoContent.wind, climate: demoContent.climate })
      .where(eq(projectTable.id, created.id));
    const wall = await assemblies.create(created.id, userIds.get(owner)!, demoContent.assembly);
    await assemblies.create(created.id, userIds.get(owner)!, demoPanel);
    const inspector = members.find((m) => m.role === 'envelope_consultant');
    if (inspector) {
      const person = demoScenario.users.find((u) => u.email === inspector.email)!;
      await seedDemoInspection(db, await projects.get(created.id, userIds.get(owner)!), wall.id, {
        id: userIds.get(inspector.email)!,
        name: person.name,
      });
    }
  }
  await createCriteriaService(db).create(
    firmIds.get(demoCodeTable.firm)!,
    userIds.get(demoCodeTable.createdBy)!,
    demoCodeTable.set,
    'admin',
  );
  await db
    .insert(orgAttachmentProducts)
    .values(
      demoLibrary.products.map((p) =>
        attachmentProductRow(firmIds.get(demoLibrary.firm)!, userIds.get(demoLibrary.createdBy)!, p),
      ),
    );
  return true;
}
