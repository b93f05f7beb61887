import type { JobCreate } from '../../../shared/schemas/job.schema';
import type { Role } from '../../../shared/schemas/role.schema';

/** Password of every demo account. README and `npm start` print it. */
export const DEMO_PASSWORD = 'tackline-demo';

/** A demo account (all names invented). */
export interface DemoUser {
  email: string;
  displayName: string;
  role: Role;
}

/** A demo spool and the sample design file (in samples/) its first draft starts from. */
export interface DemoSpool {
  mark: string;
  lineNumber: string;
  sampleFile: string | null;
}

/** One invented shop with its accounts and jobs. */
export interface DemoOrganisation {
  slug: string;
  name: string;
  users: DemoUser[];
  jobs: Array<{ job: JobCreate; spools: DemoSpool[] }>;
}

/**
 * The demo scenario: Kestrel Pipe & Steel building condenser-water spools for
 * Harrow Fields Data Centre, Hall B; and a second shop used to check that shops
 * never see each other's records. Every company and person here is invented.
 */
export const DEMO_ORGANISATIONS: DemoOrganisation[] = [
  {
    slug: 'kestrel',
    name: 'Kestrel Pipe & Steel',
    users: [
      { email: 'admin@kestrel.example', displayName: 'Isolde Farrant', role: 'admin' },
      { email: 'detailer@kestrel.example', displayName: 'Rafe Lindqvist', role: 'detailer' },
      { email: 'fabricator@kestrel.example', displayName: 'Dunstan Vale', role: 'fabricator' },
      { email: 'fabricator2@kestrel.example', displayName: 'Priya Halloway', role: 'fabricator' },
      { email: 'inspector@kestrel.example', displayName: 'Greta Mossop', role: 'inspector' },
      { email: 'viewer@kestrel.example', displayName: 'Anselm Tarrow', role: 'viewer' },
    ],
    jobs: [
      {
        job: {
          number: 'HFD-B-CW',
          title: 'Condenser water, Hall B',
          client: 'Harrow Fields Data Centre',
          site: 'Hall B',
          units: 'mm',
          status: 'active',
          spec: {
            material: 'ASTM A106 Gr B',
            schedule: 'STD',
            flangeClass: 150,
            rootGapMm: 3,
            sawKerfMm: 3,
            // Shop default; the brief's rule of thumb is about one diameter or 50 mm.
            minPieceLengthMm: 100,
          },
        },
        spools: [
          { mark: 'CW-201-S03', lineNumber: 'CW-201', sampleFile: 'cw-201-s03-return-14in.json' },
          { mark: 'CW-305-S01', lineNumber: 'CW-305', sampleFile: 'cw-305-s01-rolling-offset-10in.json' },
          { mark: 'CW-410-S02', lineNumber: 'CW-410', sampleFile: 'cw-410-s02-header-6in.json' },
          { mark: 'CW-118-S02', lineNumber: 'CW-118', sampleFile: 'cw-118-s02-reducer-drop-10x6.json' },
          { mark: 'CW-522-S04', lineNumber: 'CW-522', sampleFile: 'cw-522-s04-tee-mitre-10in.json' },
        ],
      },
    ],
  },
  {
    slug: 'fenwick',
    name: 'Fenwick Process Fabricators',
    users: [{ email: 'admin@fenwick.example', displayName: 'Corin Ashdown', role: 'admin' }],
    jobs: [],
  },
];
