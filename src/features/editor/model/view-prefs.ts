/** Camera presets: isometric, plan (looking down), elevations looking north and east. */
export type ViewPreset = 'iso' | 'plan' | 'elev-north' | 'elev-east';

/** What the viewer chooses to see; not part of the design, not saved with it. */
export type ViewPrefs = {
  labels: {
    /** Work-point to work-point dimensions between fittings. */
    centreToCentre: boolean;
    /** Fitting centre to flange face or open end. */
    centreToFace: boolean;
    /** Cut length of each pipe piece. */
    cutLengths: boolean;
    /** Weld numbers. */
    welds: boolean;
  };
  /** Centre of gravity marker with the weight. */
  showCentreOfGravity: boolean;
  preset: ViewPreset;
  /** Bumped when the same preset is asked for again, so the camera snaps back. */
  presetNonce: number;
  /** The last keyboard camera step (orbit and zoom); `nonce` makes each press count. */
  cameraStep: { azimuthDeg: number; elevationDeg: number; zoom: number; nonce: number };
};

/** Defaults: every label on, isometric. */
export const DEFAULT_VIEW_PREFS: ViewPrefs = {
  labels: { centreToCentre: true, centreToFace: true, cutLengths: true, welds: true },
  showCentreOfGravity: true,
  preset: 'iso',
  presetNonce: 0,
  cameraStep: { azimuthDeg: 0, elevationDeg: 0, zoom: 1, nonce: 0 },
};
