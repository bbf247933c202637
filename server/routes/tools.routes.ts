import { Router } from 'express';
import { todayIn } from '../care';
import { apiNotFound } from '../middleware/not-found';
import { parseBody, parseQuery } from '../middleware/validate';
import {
  carePlanRequestSchema, daylightQuerySchema, degreeDaysRequestSchema, ladderRequestSchema, stoneFruitCheckRequestSchema,
} from '../schemas/tools';
import * as tools from '../services/tools.service';

// Public, stateless calculations: mounted before the session and CSRF middleware (app.ts), so
// outside checkers and signed-out growers call them with no cookie and no token.
export const toolsRouter = Router();

/** "Today" for a tool without a place's time zone is today in UTC. */
const todayUtc = () => todayIn('UTC');

toolsRouter.post('/degree-days', (req, res) => {
  res.json(tools.degreeDays(parseBody(req, degreeDaysRequestSchema)));
});

toolsRouter.post('/stone-fruit-check', (req, res) => {
  res.json(tools.stoneFruitCheck(parseBody(req, stoneFruitCheckRequestSchema)));
});

toolsRouter.post('/ladder', (req, res) => {
  res.json(tools.ladder(parseBody(req, ladderRequestSchema)));
});

toolsRouter.post('/care-plan', (req, res) => {
  res.json(tools.carePlan(parseBody(req, carePlanRequestSchema), todayUtc()));
});

toolsRouter.get('/daylight', (req, res) => {
  res.json(tools.daylightOn(parseQuery(req, daylightQuerySchema), todayUtc()));
});

// An unknown tool answers 404 here rather than falling through to the CSRF check (a 403 would mislead).
toolsRouter.use(apiNotFound);
