import { z } from 'zod';

/** A phone's full-size photo is 2–6 MB; 8 MB leaves room for that and refuses anything much bigger. */
export const PHOTO_LIMIT_BYTES = 8 * 1024 * 1024;
export const photoTypes = ['image/jpeg', 'image/png', 'image/webp'] as const;

export const photoParamsSchema = z.object({ photoId: z.uuid({ message: 'Not a valid photo id' }) }).loose();
export const photoQuerySchema = z.object({ size: z.enum(['full', 'thumb']).default('full') });
