import type {
  CarePlanRequest, CarePlanResponse, DaylightResponse, DegreeDaysRequest, DegreeDaysResponse,
  LadderRequest, LadderResponse, StoneFruitCheckRequest, StoneFruitCheckResponse,
} from '../../server/schemas/tools';
import { http, type RequestOptions } from './http';

const stateless: RequestOptions = { isStateless: true };

// The public tools: they work signed out, and the server keeps nothing from them.

export const calculateDegreeDays = (body: DegreeDaysRequest) => http.post<DegreeDaysResponse>('/api/tools/degree-days', body, stateless);

export const checkStoneFruit = (body: StoneFruitCheckRequest) => http.post<StoneFruitCheckResponse>('/api/tools/stone-fruit-check', body, stateless);

export const planLadder = (body: LadderRequest) => http.post<LadderResponse>('/api/tools/ladder', body, stateless);

export const carePlan = (body: CarePlanRequest) => http.post<CarePlanResponse>('/api/tools/care-plan', body, stateless);

export const getDaylight = (query: { lat: number; lon: number; date?: string; tz?: string }) =>
  http.get<DaylightResponse>('/api/tools/daylight', query);
