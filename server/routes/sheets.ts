import { sheetQuerySchema, verificationSchema, verifyParamsSchema } from '@shared/schemas/sheets';
import { z } from 'zod';
import { errorResponse, refusals } from '../http/responses';
import { sendPdf } from '../http/route';
import { anyone, member, routeGroup } from '../http/route-group';

const route = routeGroup('Compliance sheets');

export const sheetRoutes = [
  route.get('/check-runs/:runId/sheet.pdf', member('assembly.read'), {
    summary:
      'The compliance sheet of a stored check run (PDF: title block, inputs, section to scale, results, charts, checks, cautions, verification code); `?sweep=` adds a saved sweep of the same assembly as an appendix',
    query: sheetQuerySchema,
    responses: {
      200: {
        description: 'The sheet',
        contentType: 'application/pdf',
        schema: z.string().describe('PDF bytes'),
      },
      ...refusals('project', 'run (or sweep of its assembly)'),
      400: errorResponse('Invalid query'),
    },
    handler: async ({ params, query, user, res, services }) => {
      const sweep = query.sweep ? await services.sweeps.get(query.sweep) : undefined;
      return sendPdf(
        res,
        await services.sheets.render(params.runId, user.id, query.units, sweep),
        query.disposition,
      );
    },
  }),
  route.get('/verify/:code', anyone, {
    summary:
      'Confirm a compliance sheet or a field report by its verification code (no sign-in): issuer, project, assembly, date, verdict or inspection state',
    params: verifyParamsSchema,
    responses: {
      200: {
        description: 'The sheet or report is genuine: what it states (`kind` says which)',
        schema: verificationSchema,
      },
      404: errorResponse('No such sheet (unknown, mistyped or altered code)'),
    },
    handler: ({ params, res, services }) => {
      res.set('Cache-Control', 'no-store');
      return services.sheets.verify(params.code);
    },
  }),
];
