import type { DataStatus } from './data-status';
import type { Nps } from './nps';
import type { Schedule } from './pipe-schedules';

/** One wall cell: thickness in mm and how well it is confirmed. */
export type WallCell = readonly [wallMm: number, status: DataStatus];

/** One NPS row of the ASME B36.10M metric table. */
export type PipeRow = {
  nps: Nps;
  /** Outside diameter, mm, as B36.10M gives it (metric table, not converted inches). */
  odMm: number;
  odStatus: DataStatus;
  walls: Partial<Record<Schedule, WallCell>>;
  /** Which tables the S values came from (standard and table only), and caveats. */
  source: string;
};

const SRC_SMALL = 'ASME B36.10M metric table';
const SRC_A53 = 'ASME B36.10M metric table, confirmed against the ASTM A53 dimension table';
const SRC_LARGE =
  'ASME B36.10M text (STD = 9.53 mm above NPS 10) and metric table (Sch 40); ODs confirmed by the ASME B16.9 OD-at-bevel columns';
const MEM = 'Other schedules are from memory (status M); Sch 10 up to NPS 12 equals the B36.19 10S wall.';

/**
 * ASME B36.10M welded and seamless wrought steel pipe, metric (mm).
 * Standard and Sch 40 are identical up to NPS 10; XS and Sch 80 up to NPS 8 (from memory:
 * the sourced text is cut off there). Larger STD walls are 9.53 mm, larger XS 12.70 mm.
 */
// prettier-ignore
export const PIPE_TABLE: readonly PipeRow[] = [
  { nps: '1/2', odMm: 21.3, odStatus: 'S', source: `${SRC_SMALL}. ${MEM}`,
    walls: { '10': [2.11, 'M'], STD: [2.77, 'S'], '40': [2.77, 'S'], XS: [3.73, 'S'], '80': [3.73, 'S'], '160': [4.78, 'M'], XXS: [7.47, 'M'] } },
  { nps: '3/4', odMm: 26.7, odStatus: 'S', source: `${SRC_SMALL}. ${MEM}`,
    walls: { '10': [2.11, 'M'], STD: [2.87, 'S'], '40': [2.87, 'S'], XS: [3.91, 'S'], '80': [3.91, 'S'], '160': [5.56, 'M'], XXS: [7.82, 'M'] } },
  { nps: '1', odMm: 33.4, odStatus: 'S', source: `${SRC_SMALL}. ${MEM}`,
    walls: { '10': [2.77, 'M'], STD: [3.38, 'S'], '40': [3.38, 'S'], XS: [4.55, 'S'], '80': [4.55, 'S'], '160': [6.35, 'M'], XXS: [9.09, 'M'] } },
  { nps: '1-1/4', odMm: 42.2, odStatus: 'S~', source: `OD from the ASME B16.9 short-radius elbow table (OD column); STD/Sch 40 0.140 in in a pipe-fitter's handbook table and an ASTM A53 chart; Sch 80 0.191 in in a secondary Sch 80 table. ${MEM}`,
    walls: { '10': [2.77, 'M'], STD: [3.56, 'S~'], '40': [3.56, 'S~'], XS: [4.85, 'S~'], '80': [4.85, 'S~'], '160': [6.35, 'M'], XXS: [9.7, 'M'] } },
  { nps: '1-1/2', odMm: 48.3, odStatus: 'S', source: `${SRC_SMALL}; mm walls converted from the inch walls (0.145 in, 0.200 in). ${MEM}`,
    walls: { '10': [2.77, 'M'], STD: [3.68, 'S'], '40': [3.68, 'S'], XS: [5.08, 'S'], '80': [5.08, 'S'], '160': [7.14, 'M'], XXS: [10.15, 'M'] } },
  { nps: '2', odMm: 60.3, odStatus: 'S', source: `${SRC_A53}. ${MEM}`,
    walls: { '10': [2.77, 'M'], STD: [3.91, 'S'], '40': [3.91, 'S'], XS: [5.54, 'S'], '80': [5.54, 'S'], '160': [8.74, 'M'], XXS: [11.07, 'M'] } },
  { nps: '2-1/2', odMm: 73.0, odStatus: 'S~', source: `OD from the ASME B16.9 reducing-elbow table (OD at bevel); STD/Sch 40 0.203 in in a pipe-fitter's handbook table. ${MEM}`,
    walls: { '10': [3.05, 'M'], STD: [5.16, 'S~'], '40': [5.16, 'S~'], XS: [7.01, 'M'], '80': [7.01, 'M'], '160': [9.53, 'M'], XXS: [14.02, 'M'] } },
  { nps: '3', odMm: 88.9, odStatus: 'S', source: `${SRC_A53}. ${MEM}`,
    walls: { '10': [3.05, 'M'], STD: [5.49, 'S'], '40': [5.49, 'S'], XS: [7.62, 'S'], '80': [7.62, 'S'], '160': [11.13, 'M'], XXS: [15.24, 'M'] } },
  { nps: '4', odMm: 114.3, odStatus: 'S', source: `ASME B36.10M metric table. ${MEM}`,
    walls: { '10': [3.05, 'M'], STD: [6.02, 'S'], '40': [6.02, 'S'], XS: [8.56, 'S'], '80': [8.56, 'S'], '120': [11.13, 'M'], '160': [13.49, 'M'], XXS: [17.12, 'M'] } },
  { nps: '5', odMm: 141.3, odStatus: 'S~', source: `OD from the ASME B16.9 reducing-elbow table (OD at bevel); STD/Sch 40 0.258 in in a pipe-fitter's handbook table. ${MEM}`,
    walls: { '10': [3.4, 'M'], STD: [6.55, 'S~'], '40': [6.55, 'S~'], XS: [9.53, 'M'], '80': [9.53, 'M'], '120': [12.7, 'M'], '160': [15.88, 'M'], XXS: [19.05, 'M'] } },
  { nps: '6', odMm: 168.3, odStatus: 'S', source: `${SRC_SMALL}; mm walls converted from 0.280 in / 0.432 in. ${MEM}`,
    walls: { '10': [3.4, 'M'], STD: [7.11, 'S'], '40': [7.11, 'S'], XS: [10.97, 'S'], '80': [10.97, 'S'], '120': [14.27, 'M'], '160': [18.26, 'M'], XXS: [21.95, 'M'] } },
  { nps: '8', odMm: 219.1, odStatus: 'S', source: `${SRC_SMALL}; Sch 20/30 0.250/0.277 in in a pipe-fitter's handbook table. ${MEM}`,
    walls: { '10': [3.76, 'M'], '20': [6.35, 'S~'], '30': [7.04, 'S~'], STD: [8.18, 'S'], '40': [8.18, 'S'], '60': [10.31, 'M'], XS: [12.7, 'S'], '80': [12.7, 'S'], '120': [18.26, 'M'], '160': [23.01, 'M'], XXS: [22.23, 'M'] } },
  { nps: '10', odMm: 273.0, odStatus: 'S', source: `${SRC_SMALL}; Sch 20/30 0.250/0.307 in in a pipe-fitter's handbook table; Sch 80 15.09 mm (0.594 in): one secondary table lists the XS value under Sch 80, another 0.593 in. ${MEM}`,
    walls: { '10': [4.19, 'M'], '20': [6.35, 'S~'], '30': [7.8, 'S~'], STD: [9.27, 'S'], '40': [9.27, 'S'], XS: [12.7, 'S'], '60': [12.7, 'M'], '80': [15.09, 'S~'], '120': [21.44, 'M'], '160': [28.58, 'M'], XXS: [25.4, 'M'] } },
  { nps: '12', odMm: 323.8, odStatus: 'S', source: `${SRC_LARGE}. XS 12.70 mm above NPS 10 from memory; Sch 80 0.688 in in a secondary Sch 80 table. ${MEM}`,
    walls: { '10': [4.57, 'M'], '20': [6.35, 'M'], '30': [8.38, 'M'], STD: [9.53, 'S'], '40': [10.31, 'S'], XS: [12.7, 'M'], '60': [14.27, 'M'], '80': [17.48, 'S~'], '120': [25.4, 'M'], '160': [33.32, 'M'], XXS: [25.4, 'M'] } },
  { nps: '14', odMm: 355.6, odStatus: 'S', source: `${SRC_LARGE}. XS 12.70 mm above NPS 10 from memory. ${MEM}`,
    walls: { '10': [6.35, 'M'], '20': [7.92, 'M'], '30': [9.53, 'M'], STD: [9.53, 'S'], '40': [11.13, 'S'], XS: [12.7, 'M'], '60': [15.09, 'M'], '80': [19.05, 'M'], '120': [27.79, 'M'], '160': [35.71, 'M'] } },
  { nps: '16', odMm: 406.4, odStatus: 'S', source: `${SRC_LARGE}. XS 12.70 mm above NPS 10 from memory. ${MEM}`,
    walls: { '10': [6.35, 'M'], '20': [7.92, 'M'], '30': [9.53, 'M'], STD: [9.53, 'S'], '40': [12.7, 'S'], XS: [12.7, 'M'], '60': [16.66, 'M'], '80': [21.44, 'M'], '120': [30.96, 'M'], '160': [40.49, 'M'] } },
  { nps: '18', odMm: 457, odStatus: 'S', source: `${SRC_LARGE}. XS 12.70 mm above NPS 10 from memory. ${MEM}`,
    walls: { '10': [6.35, 'M'], '20': [7.92, 'M'], '30': [11.13, 'M'], STD: [9.53, 'S'], '40': [14.27, 'S'], XS: [12.7, 'M'], '60': [19.05, 'M'], '80': [23.83, 'M'], '120': [34.93, 'M'], '160': [45.24, 'M'] } },
  { nps: '20', odMm: 508, odStatus: 'S', source: `${SRC_LARGE}. XS 12.70 mm above NPS 10 from memory. ${MEM}`,
    walls: { '10': [6.35, 'M'], '20': [9.53, 'M'], '30': [12.7, 'M'], STD: [9.53, 'S'], '40': [15.09, 'S'], XS: [12.7, 'M'], '60': [20.62, 'M'], '80': [26.19, 'M'], '120': [38.1, 'M'], '160': [50.01, 'M'] } },
  { nps: '24', odMm: 610, odStatus: 'S', source: `${SRC_LARGE}. XS 12.70 mm above NPS 10 from memory. ${MEM}`,
    walls: { '10': [6.35, 'M'], '20': [9.53, 'M'], '30': [14.27, 'M'], STD: [9.53, 'S'], '40': [17.48, 'S'], XS: [12.7, 'M'], '60': [24.61, 'M'], '80': [30.96, 'M'], '120': [46.02, 'M'], '160': [59.54, 'M'] } },
];
