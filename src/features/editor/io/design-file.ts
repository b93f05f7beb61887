import { spoolDesignSchema, type SpoolDesign } from '../../../../shared/schemas/spool-design.schema';

/** Largest design file accepted, bytes (a 5,000-node design is well under this). */
export const MAX_DESIGN_FILE_BYTES = 5 * 1024 * 1024;

/** The design as a pretty-printed `.tackline.json` document. */
export function designToJson(design: SpoolDesign): string {
  return `${JSON.stringify(design, null, 2)}\n`;
}

/** Result of reading a design file. */
export type DesignFileRead = { ok: true; design: SpoolDesign } | { ok: false; message: string };

/**
 * Reads a design file's text: JSON, then the spool design schema. The message names
 * the first problem with its path (e.g. `nodes.2.end.type`), so the user can fix the file.
 */
export function designFromJson(text: string): DesignFileRead {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return { ok: false, message: 'The file is not JSON: choose a Tackline spool design (.json) file' };
  }
  const parsed = spoolDesignSchema.safeParse(raw);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    const where = first?.path.length ? `${first.path.join('.')}: ` : '';
    const more = parsed.error.issues.length > 1 ? ` (and ${parsed.error.issues.length - 1} more problems)` : '';
    return { ok: false, message: `Not a valid spool design: ${where}${first?.message ?? 'invalid'}${more}` };
  }
  return { ok: true, design: parsed.data };
}

/** A safe file name from a spool mark. */
export function fileNameFor(mark: string | undefined, extension: string): string {
  const base = (mark ?? 'spool').replace(/[^A-Za-z0-9._-]+/g, '_').replace(/^_+|_+$/g, '') || 'spool';
  return `${base}.${extension}`;
}

/** Offers `data` to the browser as a download. */
export function downloadBlob(data: BlobPart, type: string, fileName: string): void {
  const url = URL.createObjectURL(new Blob([data], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
