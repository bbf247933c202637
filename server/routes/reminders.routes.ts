import { Router } from 'express';
import { requireAuth } from '../middleware/require-auth';
import { parseBody } from '../middleware/validate';
import { reminderPreferencesUpdateSchema } from '../schemas/reminders';
import * as preferences from '../services/reminder-preferences.service';

// The signed-in person's own reminder settings and calendar link; there is no id in the path, so
// nobody can reach anyone else's.
export const remindersRouter = Router();
remindersRouter.use(requireAuth);

remindersRouter.get('/preferences', async (req, res) => {
  res.json(await preferences.getPreferences(req.user!.id));
});

remindersRouter.patch('/preferences', async (req, res) => {
  res.json(await preferences.updatePreferences(req.user!.id, parseBody(req, reminderPreferencesUpdateSchema)));
});

remindersRouter.post('/calendar', async (req, res) => {
  res.status(201).json(await preferences.regenerateCalendar(req.user!.id));
});
