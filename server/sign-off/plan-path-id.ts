import type { Request } from 'express';
import { pathId } from '../http/request-context';

/** The plan id of the sign-off and export routes; a malformed one is answered 422, as these routes always have. */
export const planPathId = (req: Request): string => pathId(req, 'plan', { invalid: 'The plan id is not a valid id.' });
