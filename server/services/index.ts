import type { Request } from 'express';
import { type Auth, sessionUser } from '../auth/auth';
import type { Config } from '../config';
import type { Database } from '../db/client';
import type { Mailer } from '../mail/mailer';
import { createAssemblyService } from './assemblies';
import { createAuditService } from './audit';
import { createLibraryService } from './library';
import { createMeService } from './me';
import { createMemberService } from './members';
import { createProjectService } from './projects';

/** Everything a route may use; routes never touch the database directly. */
export function createServices(database: Database, config: Config, mailer: Mailer, auth: Auth) {
  const { db } = database;
  return {
    databaseKind: database.kind,
    auth: { instance: auth, currentUser: (req: Request) => sessionUser(auth, req) },
    audit: createAuditService(db),
    me: createMeService(db),
    projects: createProjectService(db),
    members: createMemberService(db, config, mailer),
    assemblies: createAssemblyService(db),
    library: createLibraryService(db),
  };
}

export type Services = ReturnType<typeof createServices>;
