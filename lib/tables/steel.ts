import type { SteelGrade, WShape } from "./types";

/**
 * Hot-rolled W-shapes common in house framing (W6 to W12), with every property the AISC 360
 * checks read. Units: lb/ft, in, in^2, in^3, in^4, in^6.
 *
 * Source: AISC Shapes Database v15.0 (the data behind the AISC Steel Construction Manual,
 * 15th ed., Table 1-1). Every row was checked field by field against the v15.0 extraction
 * ronkok/Hurmet publishes (site/ce/AISC-v15-wideFlanges.csv: A, d, bf, tw, tf, kdes, Ix, Zx, Sx,
 * rx, Iy, Zy, Sy, ry, J, Cw, rts); ho, bf/2tf and h/tw, which that file leaves out, agree with
 * d − tf, bf/(2 tf) and (d − 2 kdes)/tw to the database's rounding. tests/tables/steel.test.ts
 * holds those published values and the physics checks.
 */
const AISC_V15 =
  "AISC Shapes Database v15.0 (Steel Construction Manual 15th ed., Table 1-1); checked against the v15.0 extraction in ronkok/Hurmet (AISC-v15-wideFlanges.csv)";

export const W_SHAPES: WShape[] = [
  { name: "W6x9", W: 9, A: 2.68, d: 5.9, bf: 3.94, tw: 0.17, tf: 0.215, kdes: 0.465, bf_2tf: 9.16, h_tw: 29.2, Ix: 16.4, Zx: 6.23, Sx: 5.56, rx: 2.47, Iy: 2.2, Zy: 1.72, Sy: 1.11, ry: 0.905, J: 0.0405, Cw: 17.7, rts: 1.06, ho: 5.69, source: AISC_V15 },
  { name: "W6x12", W: 12, A: 3.55, d: 6.03, bf: 4, tw: 0.23, tf: 0.28, kdes: 0.53, bf_2tf: 7.14, h_tw: 21.6, Ix: 22.1, Zx: 8.3, Sx: 7.31, rx: 2.49, Iy: 2.99, Zy: 2.32, Sy: 1.5, ry: 0.918, J: 0.0903, Cw: 24.7, rts: 1.08, ho: 5.75, source: AISC_V15 },
  { name: "W6x15", W: 15, A: 4.43, d: 5.99, bf: 5.99, tw: 0.23, tf: 0.26, kdes: 0.51, bf_2tf: 11.5, h_tw: 21.6, Ix: 29.1, Zx: 10.8, Sx: 9.72, rx: 2.56, Iy: 9.32, Zy: 4.75, Sy: 3.11, ry: 1.45, J: 0.101, Cw: 76.5, rts: 1.66, ho: 5.73, source: AISC_V15 },
  { name: "W6x20", W: 20, A: 5.87, d: 6.2, bf: 6.02, tw: 0.26, tf: 0.365, kdes: 0.615, bf_2tf: 8.25, h_tw: 19.1, Ix: 41.4, Zx: 14.9, Sx: 13.4, rx: 2.66, Iy: 13.3, Zy: 6.72, Sy: 4.41, ry: 1.5, J: 0.24, Cw: 113, rts: 1.7, ho: 5.84, source: AISC_V15 },
  { name: "W6x25", W: 25, A: 7.34, d: 6.38, bf: 6.08, tw: 0.32, tf: 0.455, kdes: 0.705, bf_2tf: 6.68, h_tw: 15.5, Ix: 53.4, Zx: 18.9, Sx: 16.7, rx: 2.7, Iy: 17.1, Zy: 8.56, Sy: 5.61, ry: 1.52, J: 0.461, Cw: 150, rts: 1.74, ho: 5.93, source: AISC_V15 },
  { name: "W8x10", W: 10, A: 2.96, d: 7.89, bf: 3.94, tw: 0.17, tf: 0.205, kdes: 0.505, bf_2tf: 9.61, h_tw: 40.5, Ix: 30.8, Zx: 8.87, Sx: 7.81, rx: 3.22, Iy: 2.09, Zy: 1.66, Sy: 1.06, ry: 0.841, J: 0.0426, Cw: 30.9, rts: 1.01, ho: 7.69, source: AISC_V15 },
  { name: "W8x13", W: 13, A: 3.84, d: 7.99, bf: 4, tw: 0.23, tf: 0.255, kdes: 0.555, bf_2tf: 7.84, h_tw: 29.9, Ix: 39.6, Zx: 11.4, Sx: 9.91, rx: 3.21, Iy: 2.73, Zy: 2.15, Sy: 1.37, ry: 0.843, J: 0.0871, Cw: 40.8, rts: 1.03, ho: 7.74, source: AISC_V15 },
  { name: "W8x15", W: 15, A: 4.44, d: 8.11, bf: 4.02, tw: 0.245, tf: 0.315, kdes: 0.615, bf_2tf: 6.37, h_tw: 28.1, Ix: 48, Zx: 13.6, Sx: 11.8, rx: 3.29, Iy: 3.41, Zy: 2.67, Sy: 1.7, ry: 0.876, J: 0.137, Cw: 51.8, rts: 1.06, ho: 7.8, source: AISC_V15 },
  { name: "W8x18", W: 18, A: 5.26, d: 8.14, bf: 5.25, tw: 0.23, tf: 0.33, kdes: 0.63, bf_2tf: 7.95, h_tw: 29.9, Ix: 61.9, Zx: 17, Sx: 15.2, rx: 3.43, Iy: 7.97, Zy: 4.66, Sy: 3.04, ry: 1.23, J: 0.172, Cw: 122, rts: 1.43, ho: 7.81, source: AISC_V15 },
  { name: "W8x21", W: 21, A: 6.16, d: 8.28, bf: 5.27, tw: 0.25, tf: 0.4, kdes: 0.7, bf_2tf: 6.59, h_tw: 27.5, Ix: 75.3, Zx: 20.4, Sx: 18.2, rx: 3.49, Iy: 9.77, Zy: 5.69, Sy: 3.71, ry: 1.26, J: 0.282, Cw: 152, rts: 1.46, ho: 7.88, source: AISC_V15 },
  { name: "W8x24", W: 24, A: 7.08, d: 7.93, bf: 6.5, tw: 0.245, tf: 0.4, kdes: 0.794, bf_2tf: 8.12, h_tw: 25.9, Ix: 82.7, Zx: 23.1, Sx: 20.9, rx: 3.42, Iy: 18.3, Zy: 8.57, Sy: 5.63, ry: 1.61, J: 0.346, Cw: 259, rts: 1.81, ho: 7.53, source: AISC_V15 },
  { name: "W8x28", W: 28, A: 8.25, d: 8.06, bf: 6.54, tw: 0.285, tf: 0.465, kdes: 0.859, bf_2tf: 7.03, h_tw: 22.3, Ix: 98, Zx: 27.2, Sx: 24.3, rx: 3.45, Iy: 21.7, Zy: 10.1, Sy: 6.63, ry: 1.62, J: 0.537, Cw: 312, rts: 1.84, ho: 7.6, source: AISC_V15 },
  { name: "W8x31", W: 31, A: 9.13, d: 8, bf: 8, tw: 0.285, tf: 0.435, kdes: 0.829, bf_2tf: 9.19, h_tw: 22.3, Ix: 110, Zx: 30.4, Sx: 27.5, rx: 3.47, Iy: 37.1, Zy: 14.1, Sy: 9.27, ry: 2.02, J: 0.536, Cw: 530, rts: 2.26, ho: 7.57, source: AISC_V15 },
  { name: "W10x12", W: 12, A: 3.54, d: 9.87, bf: 3.96, tw: 0.19, tf: 0.21, kdes: 0.51, bf_2tf: 9.43, h_tw: 46.6, Ix: 53.8, Zx: 12.6, Sx: 10.9, rx: 3.9, Iy: 2.18, Zy: 1.74, Sy: 1.1, ry: 0.785, J: 0.0547, Cw: 50.9, rts: 0.983, ho: 9.66, source: AISC_V15 },
  { name: "W10x15", W: 15, A: 4.41, d: 9.99, bf: 4, tw: 0.23, tf: 0.27, kdes: 0.57, bf_2tf: 7.41, h_tw: 38.5, Ix: 68.9, Zx: 16, Sx: 13.8, rx: 3.95, Iy: 2.89, Zy: 2.3, Sy: 1.45, ry: 0.81, J: 0.104, Cw: 68.3, rts: 1.01, ho: 9.72, source: AISC_V15 },
  { name: "W10x17", W: 17, A: 4.99, d: 10.1, bf: 4.01, tw: 0.24, tf: 0.33, kdes: 0.63, bf_2tf: 6.08, h_tw: 36.9, Ix: 81.9, Zx: 18.7, Sx: 16.2, rx: 4.05, Iy: 3.56, Zy: 2.8, Sy: 1.78, ry: 0.845, J: 0.156, Cw: 85.1, rts: 1.04, ho: 9.77, source: AISC_V15 },
  { name: "W10x19", W: 19, A: 5.62, d: 10.2, bf: 4.02, tw: 0.25, tf: 0.395, kdes: 0.695, bf_2tf: 5.09, h_tw: 35.4, Ix: 96.3, Zx: 21.6, Sx: 18.8, rx: 4.14, Iy: 4.29, Zy: 3.35, Sy: 2.14, ry: 0.874, J: 0.233, Cw: 104, rts: 1.06, ho: 9.81, source: AISC_V15 },
  { name: "W10x22", W: 22, A: 6.49, d: 10.2, bf: 5.75, tw: 0.24, tf: 0.36, kdes: 0.66, bf_2tf: 7.99, h_tw: 36.9, Ix: 118, Zx: 26, Sx: 23.2, rx: 4.27, Iy: 11.4, Zy: 6.1, Sy: 3.97, ry: 1.33, J: 0.239, Cw: 275, rts: 1.55, ho: 9.84, source: AISC_V15 },
  { name: "W10x26", W: 26, A: 7.61, d: 10.3, bf: 5.77, tw: 0.26, tf: 0.44, kdes: 0.74, bf_2tf: 6.56, h_tw: 34, Ix: 144, Zx: 31.3, Sx: 27.9, rx: 4.35, Iy: 14.1, Zy: 7.5, Sy: 4.89, ry: 1.36, J: 0.402, Cw: 345, rts: 1.58, ho: 9.86, source: AISC_V15 },
  { name: "W10x30", W: 30, A: 8.84, d: 10.5, bf: 5.81, tw: 0.3, tf: 0.51, kdes: 0.81, bf_2tf: 5.7, h_tw: 29.5, Ix: 170, Zx: 36.6, Sx: 32.4, rx: 4.38, Iy: 16.7, Zy: 8.84, Sy: 5.75, ry: 1.37, J: 0.622, Cw: 414, rts: 1.6, ho: 9.99, source: AISC_V15 },
  { name: "W10x33", W: 33, A: 9.71, d: 9.73, bf: 7.96, tw: 0.29, tf: 0.435, kdes: 0.935, bf_2tf: 9.15, h_tw: 27.1, Ix: 171, Zx: 38.8, Sx: 35, rx: 4.19, Iy: 36.6, Zy: 14, Sy: 9.2, ry: 1.94, J: 0.583, Cw: 791, rts: 2.2, ho: 9.3, source: AISC_V15 },
  { name: "W12x14", W: 14, A: 4.16, d: 11.9, bf: 3.97, tw: 0.2, tf: 0.225, kdes: 0.525, bf_2tf: 8.82, h_tw: 54.3, Ix: 88.6, Zx: 17.4, Sx: 14.9, rx: 4.62, Iy: 2.36, Zy: 1.9, Sy: 1.19, ry: 0.753, J: 0.0704, Cw: 80.4, rts: 0.961, ho: 11.7, source: AISC_V15 },
  { name: "W12x16", W: 16, A: 4.71, d: 12, bf: 3.99, tw: 0.22, tf: 0.265, kdes: 0.565, bf_2tf: 7.53, h_tw: 49.4, Ix: 103, Zx: 20.1, Sx: 17.1, rx: 4.67, Iy: 2.82, Zy: 2.26, Sy: 1.41, ry: 0.773, J: 0.103, Cw: 96.9, rts: 0.983, ho: 11.7, source: AISC_V15 },
  { name: "W12x19", W: 19, A: 5.57, d: 12.2, bf: 4.01, tw: 0.235, tf: 0.35, kdes: 0.65, bf_2tf: 5.72, h_tw: 46.2, Ix: 130, Zx: 24.7, Sx: 21.3, rx: 4.82, Iy: 3.76, Zy: 2.98, Sy: 1.88, ry: 0.822, J: 0.18, Cw: 131, rts: 1.02, ho: 11.9, source: AISC_V15 },
  { name: "W12x22", W: 22, A: 6.48, d: 12.3, bf: 4.03, tw: 0.26, tf: 0.425, kdes: 0.725, bf_2tf: 4.74, h_tw: 41.8, Ix: 156, Zx: 29.3, Sx: 25.4, rx: 4.91, Iy: 4.66, Zy: 3.66, Sy: 2.31, ry: 0.848, J: 0.293, Cw: 164, rts: 1.04, ho: 11.9, source: AISC_V15 },
  { name: "W12x26", W: 26, A: 7.65, d: 12.2, bf: 6.49, tw: 0.23, tf: 0.38, kdes: 0.68, bf_2tf: 8.54, h_tw: 47.2, Ix: 204, Zx: 37.2, Sx: 33.4, rx: 5.17, Iy: 17.3, Zy: 8.17, Sy: 5.34, ry: 1.51, J: 0.3, Cw: 607, rts: 1.75, ho: 11.8, source: AISC_V15 },
  { name: "W12x30", W: 30, A: 8.79, d: 12.3, bf: 6.52, tw: 0.26, tf: 0.44, kdes: 0.74, bf_2tf: 7.41, h_tw: 41.8, Ix: 238, Zx: 43.1, Sx: 38.6, rx: 5.21, Iy: 20.3, Zy: 9.56, Sy: 6.24, ry: 1.52, J: 0.457, Cw: 720, rts: 1.77, ho: 11.9, source: AISC_V15 },
  { name: "W12x35", W: 35, A: 10.3, d: 12.5, bf: 6.56, tw: 0.3, tf: 0.52, kdes: 0.82, bf_2tf: 6.31, h_tw: 36.2, Ix: 285, Zx: 51.2, Sx: 45.6, rx: 5.25, Iy: 24.5, Zy: 11.5, Sy: 7.47, ry: 1.54, J: 0.741, Cw: 879, rts: 1.79, ho: 12, source: AISC_V15 },
];

/**
 * ASTM steel grades for W-shapes, ksi: minimum Fy and Fu of ASTM A992 and A36 (AISC Steel
 * Construction Manual 15th ed., Table 2-4). The steel grade table has no source column; this is its
 * source, shown on the admin screen: checked against an open-source material library (a YAML list
 * "ASTM A992, 50ksi … Fu 65.0E+3", "ASTM A36, 36ksi … Fu 58.0E+3").
 */
export const STEEL_GRADES_SOURCE =
  "AISC Steel Construction Manual 15th ed., Table 2-4 (ASTM A992, A36 minimums); checked against an open-source material library's steel list";

export const STEEL_GRADES: SteelGrade[] = [
  { name: "A992", Fy: 50, Fu: 65 },
  { name: "A36", Fy: 36, Fu: 58 },
];
