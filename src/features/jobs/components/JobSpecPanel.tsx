import type { ReactNode } from 'react';
import type { Job } from '../../../../shared/schemas/job.schema';
import { formatLength } from '../../../../shared/units/length-format';

/** A spec value in the job's units; ft-in jobs also show the stored millimetres. */
function Dim({ mm, units }: { mm: number; units: Job['units'] }) {
  return (
    <span className="font-mono">
      {formatLength(mm, units)}
      {units === 'ft-in' ? <span className="text-steel-500"> ({formatLength(mm, 'mm')})</span> : null}
    </span>
  );
}

/** The job's default spec: what new spools start from. */
export function JobSpecPanel({ job }: { job: Job }) {
  const rows: [string, ReactNode][] = [
    ['Material', job.spec.material],
    ['Schedule / wall', <span className="font-mono">{job.spec.schedule}</span>],
    ['Flange class', <span className="font-mono">Class {job.spec.flangeClass}</span>],
    ['Root gap', <Dim mm={job.spec.rootGapMm} units={job.units} />],
    ['Saw kerf', <Dim mm={job.spec.sawKerfMm} units={job.units} />],
    ['Shortest piece', <Dim mm={job.spec.minPieceLengthMm} units={job.units} />],
    ['Units', <span className="font-mono">{job.units === 'mm' ? 'mm' : 'ft-in (1/16")'}</span>],
  ];
  return (
    <section aria-labelledby="job-spec" className="rounded-lg border border-steel-200 bg-white p-4">
      <h2 id="job-spec" className="text-xl font-semibold text-ink-800">
        Default spec
      </h2>
      <dl className="mt-3 grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-3 lg:grid-cols-4">
        {rows.map(([label, value]) => (
          <div key={label}>
            <dt className="text-xs font-semibold uppercase tracking-wide text-steel-500">{label}</dt>
            <dd className="text-sm text-ink-900">{value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
