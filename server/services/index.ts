import { type Auth, createSessionReader } from '../auth/auth';
import type { Config } from '../config';
import type { Database } from '../db/client';
import type { Mailer } from '../mail/mailer';
import type { ObjectStore } from '../storage/object-store';
import { createAssemblyService } from './assemblies';
import { createAuditService } from './audit';
import { createBridgeService } from './bridge';
import { createCheckRunService } from './check-runs';
import { createCriteriaService } from './criteria';
import { conflict } from './errors';
import { createFirmMemberService } from './firm-members';
import { createInspectionService } from './inspections';
import { createLibraryService } from './library';
import { createMeService } from './me';
import { createMemberService } from './members';
import { createOrganisationService } from './organisations';
import { createProjectService } from './projects';
import { createSavedSweepService } from './saved-sweeps';
import { createSheetService } from './sheets';
import { createSubmittalService } from './submittals';
import { createSweepService } from './sweep';
import { createSweepCostService } from './sweep-costs';

/** Everything a route may use; routes never touch the database directly. */
export function createServices(
  database: Database,
  config: Config,
  mailer: Mailer,
  auth: Auth,
  storage: ObjectStore,
) {
  const { db } = database;
  const criteria = createCriteriaService(db);
  const checkRuns = createCheckRunService(db, criteria);
  const sheets = createSheetService(db, config, checkRuns);
  const sweepCosts = createSweepCostService(db);
  return {
    databaseKind: database.kind,
    /** Hot backup of the embedded database (PGlite); a PostgreSQL server is backed up with pg_dump. */
    async backup(): Promise<Buffer> {
      if (!database.dumpDataDir)
        throw conflict('not_supported', 'the database is a PostgreSQL server: back it up with pg_dump');
      return Buffer.from(await (await database.dumpDataDir()).arrayBuffer());
    },
    auth: { instance: auth, currentUser: createSessionReader(auth) },
    audit: createAuditService(db),
    bridge: createBridgeService(config.bridgeMaxCells),
    sweep: createSweepService(config.sweepMaxVariants),
    sweepCosts,
    sweeps: createSavedSweepService(db, criteria, sweepCosts, config.sweepMaxVariants),
    me: createMeService(db),
    organisations: createOrganisationService(db),
    projects: createProjectService(db, database.readCache),
    members: createMemberService(db, config, mailer),
    assemblies: createAssemblyService(db, database.readCache),
    firmMembers: createFirmMemberService(db, config, mailer),
    library: createLibraryService(db, storage, config.storage),
    criteria,
    checkRuns,
    sheets,
    submittals: createSubmittalService({ db, config, mailer, storage, sheets }),
    inspections: createInspectionService({ db, config, mailer, storage, sheets }),
    storage,
  };
}

export type Services = ReturnType<typeof createServices>;
