import { spoolDesignSchema } from '../../../shared/schemas/spool-design.schema';
import { unprocessable } from '../../common/app-error';
import { summarise } from '../../common/validate.middleware';

/** 422 with the zod issues unless `design` is a valid spool design document. */
export function assertValidDesign(design: unknown): void {
  const result = spoolDesignSchema.safeParse(design);
  if (!result.success) {
    throw unprocessable(`The design is not a valid spool design: ${summarise(result.error)}`, {
      issues: result.error.issues,
    });
  }
}
