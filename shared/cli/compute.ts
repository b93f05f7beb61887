/**
 * CLI: `npm run -s compute -- <design.json>` prints the spool result as JSON on stdout.
 * A missing file, bad JSON or a design that fails the schema exits 1 with a message on
 * stderr naming the problem (schema problems by path). Geometry issues do not fail the
 * command: they are in the result's `issues`.
 */
import { readFile } from 'node:fs/promises';
import { spoolDesignSchema } from '../schemas/spool-design.schema';
import { computeSpool } from '../engine/compute-spool';

async function main(argv: string[]): Promise<number> {
  const file = argv[0];
  if (!file || argv.length > 1) {
    process.stderr.write('Usage: npm run -s compute -- <design.json>\n');
    return 1;
  }
  let text: string;
  try {
    text = await readFile(file, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    process.stderr.write(
      `Cannot read ${file}: ${code === 'ENOENT' ? 'no such file' : ((e as Error).message ?? String(e))}\n`,
    );
    return 1;
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    process.stderr.write(`${file} is not valid JSON: ${(e as Error).message}\n`);
    return 1;
  }
  const parsed = spoolDesignSchema.safeParse(json);
  if (!parsed.success) {
    process.stderr.write(`${file} is not a valid tackline.spool design:\n`);
    for (const i of parsed.error.issues)
      process.stderr.write(`  ${i.path.length ? i.path.join('.') : '(design)'}: ${i.message}\n`);
    return 1;
  }
  const result = computeSpool(parsed.data, { trusted: true });
  process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
  return 0;
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (e: unknown) => {
    process.stderr.write(`compute failed: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exit(1);
  },
);
