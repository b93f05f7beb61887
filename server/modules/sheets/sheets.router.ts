import { Router, type Response } from 'express';
import { idParamsSchema } from '../../../shared/schemas/id.schema';
import type { ErrorBody } from '../../../shared/schemas/error.schema';
import { AppError } from '../../common/app-error';
import { ANY_ROLE, requireRole } from '../../common/auth.middleware';
import { actorOf } from '../../common/session-actor';
import { inputOf, validate } from '../../common/validate.middleware';
import { sawListQuerySchema, spoolSheetQuerySchema } from '../../../shared/schemas/sheet-query.schema';
import type { SheetsService } from './sheets.service';

const spoolSheet = { params: idParamsSchema, query: spoolSheetQuerySchema };
const sawList = { params: idParamsSchema, query: sawListQuerySchema };

function sendPdf(res: Response, pdf: Buffer, filename: string): void {
  res.set('Content-Type', 'application/pdf');
  // inline: opens in the browser's viewer, from where it prints; the name is used on save.
  res.set('Content-Disposition', `inline; filename="${filename.replace(/[^A-Za-z0-9._-]/g, '_')}"`);
  res.set('Content-Length', String(pdf.length));
  res.end(pdf);
}

/**
 * A busy renderer's 503 is answered here, with Retry-After, in the API's error shape: it is
 * expected under load, so it is not logged as a server failure.
 */
function retryAfter(res: Response, err: unknown): null {
  if (!(err instanceof AppError) || err.status !== 503) throw err;
  const body: ErrorBody = { error: { code: err.code, message: err.message, details: err.details } };
  res.status(503).set('Retry-After', '10').json(body);
  return null;
}

/**
 * Printable sheets, for every role: the PDF is built completely before the first byte is
 * sent, so any failure is a JSON error and never a half-written PDF.
 */
export function sheetsRouter(sheets: SheetsService): Router {
  const router = Router();
  router.get('/spools/:id/sheet.pdf', requireRole(...ANY_ROLE), validate(spoolSheet), async (req, res) => {
    const { params, query } = inputOf(res, spoolSheet);
    const out = await sheets
      .spoolSheet(actorOf(req), params.id, query)
      .catch((e: unknown) => retryAfter(res, e));
    if (out) sendPdf(res, out.pdf, out.filename);
  });
  router.get('/jobs/:id/saw-list.pdf', requireRole(...ANY_ROLE), validate(sawList), async (req, res) => {
    const { params, query } = inputOf(res, sawList);
    const out = await sheets
      .sawList(actorOf(req), params.id, query)
      .catch((e: unknown) => retryAfter(res, e));
    if (out) sendPdf(res, out.pdf, out.filename);
  });
  return router;
}
