import { Router, type Response } from 'express';
import { WorkdayIdParams } from '../../shared/schemas/trips.schema.js';
import { currentUser, requireRole } from '../middleware/auth.js';
import type { SheetFile, TripSheetService } from '../services/trip-sheet.service.js';

// Private contacts inside: shown in the browser, never kept by a shared cache.
function sendPdf(res: Response, file: SheetFile): void {
  res.type('application/pdf').set({ 'Content-Disposition': `inline; filename="${file.fileName}"`, 'Cache-Control': 'private, no-store' }).send(file.pdf);
}

/** `/api/workdays/:id/trip-plan/sheet.pdf` and `…/float-plan.pdf`: coordinators and admins only. */
export function tripSheetRouter(deps: { tripSheets: TripSheetService }): Router {
  const r = Router();
  const staff = requireRole('coordinator', 'admin');

  r.get('/workdays/:id/trip-plan/sheet.pdf', staff, async (req, res) => {
    sendPdf(res, await deps.tripSheets.tripSheet(WorkdayIdParams.parse(req.params).id, currentUser(req)));
  });
  r.get('/workdays/:id/trip-plan/float-plan.pdf', staff, async (req, res) => {
    sendPdf(res, await deps.tripSheets.floatPlan(WorkdayIdParams.parse(req.params).id, currentUser(req)));
  });
  return r;
}
