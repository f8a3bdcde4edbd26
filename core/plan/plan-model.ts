/**
 * The room plan (top view, metres): what the officer draws, and what the core computes from it.
 * Plan coordinates: x to the right (east), y up the page (north), metres from a corner the officer
 * chooses. Stored inside the assessment revision's input snapshot (`RoomInput.plan`), so a signed
 * plan is as immutable as the beams it belongs to.
 */

export interface PlanPoint {
  readonly x_m: number;
  readonly y_m: number;
}

/** A door, window, interior wall or barrier: a straight piece from `a` to `b`. */
export interface PlanSegment {
  readonly id: string;
  readonly label: string;
  readonly a: PlanPoint;
  readonly b: PlanPoint;
}

export interface PlanDoor extends PlanSegment {
  /** An interlock that stops or blocks the beam when the door opens. */
  readonly interlocked?: boolean;
}

export interface PlanBarrier extends PlanSegment {
  readonly kind: 'curtain' | 'barrier';
  /** The rating as the maker states it (for example "BTL 100 W/m² for 60 s at 800 nm"), as text. */
  readonly rating: string;
}

export interface PlanWorkPosition {
  readonly id: string;
  readonly label: string;
  readonly at: PlanPoint;
  /** Radius around the point that a person there can reach with the head, m; default 0. */
  readonly reach_m?: number;
}

/** An enclosure drawn as an axis-aligned box in the plan. */
export interface PlanEnclosure {
  readonly id: string;
  readonly label: string;
  readonly min: PlanPoint;
  readonly max: PlanPoint;
}

export type PathElementKind = 'mirror' | 'dump' | 'target';

/** A point where the beam path turns (mirror) or ends (beam dump, or a target that scatters). */
export interface PathElement {
  readonly kind: PathElementKind;
  readonly at: PlanPoint;
  readonly label?: string;
  /**
   * Beam dumps and targets only: the width of the opening or face that takes the beam, m. Where the
   * beam there is at least as wide, part of it passes and its hazard zone goes on (core/plan/plan-zones.ts,
   * beamWidthAt). Absent: the element is taken to take the whole beam, as drawn.
   */
  readonly aperture_m?: number;
}

/** Where one laser sits and the path its beams take. */
export interface PlanBeamPath {
  readonly laserId: string;
  /** Exit aperture of the laser. */
  readonly exit: PlanPoint;
  /** In path order; a dump or target may only be the last element. */
  readonly elements: readonly PathElement[];
  /**
   * When the path does not end in a dump or target: direction of the beam after the last point
   * (the exit when there are no elements), degrees counter-clockwise from the +x axis.
   */
  readonly onward_deg?: number;
  /** Height of the beam above the floor, m (optional; used for the eye-level check). */
  readonly height_m?: number;
}

/** A point the officer marks as a possible diffuse reflection (a mount, a wall, a card). */
export interface PlanReflectionPoint {
  readonly id: string;
  readonly label: string;
  readonly at: PlanPoint;
  /** The laser whose beams can reach it. */
  readonly laserId: string;
}

/** The laser controlled area boundary the officer accepts. */
export interface PlanControlledArea {
  readonly outline: readonly PlanPoint[];
  /** Name of the officer who accepted the boundary. */
  readonly acceptedBy: string;
  readonly note?: string;
}

export interface RoomPlan {
  /** Room outline, corners in order (a rectangle is four corners). */
  readonly outline: readonly PlanPoint[];
  readonly doors: readonly PlanDoor[];
  readonly windows: readonly PlanSegment[];
  /** Interior walls (opaque). */
  readonly walls: readonly PlanSegment[];
  readonly barriers: readonly PlanBarrier[];
  readonly workPositions: readonly PlanWorkPosition[];
  readonly enclosures: readonly PlanEnclosure[];
  readonly paths: readonly PlanBeamPath[];
  readonly reflectionPoints: readonly PlanReflectionPoint[];
  readonly controlledArea?: PlanControlledArea;
}

// ---------------------------------------------------------------- results

/** A plan point in a result: decimal strings, metres. */
export interface PlanPointResult {
  readonly x_m: string;
  readonly y_m: string;
}

export type ZoneKind = 'direct' | 'diffuse';

/** One piece of a hazard zone, a simple polygon in plan coordinates (never smaller than the zone): a convex slice of the strip along a direct beam, or what an end of the beam sees of the 50 mm past it; for a diffuse reflection, what the spot sees of its circle (star-shaped about the spot). */
export interface PlanZone {
  readonly id: string;
  readonly kind: ZoneKind;
  readonly beamId: string;
  readonly laserId: string;
  /** Officer words, e.g. "Direct beam of Ti:sapphire amplifier (800 nm), leg 2". */
  readonly label: string;
  readonly polygon: readonly PlanPointResult[];
  /** True when the piece lies wholly inside an enclosure. */
  readonly enclosed: boolean;
  /** Diffuse zones: the NHZ radius used (rounded up), m. */
  readonly radius_m?: string;
}

/** The part of a beam path the direct-beam zone follows, after clipping. */
export interface PlanBeamRun {
  readonly beamId: string;
  readonly laserId: string;
  readonly points: readonly PlanPointResult[];
  /** Why the run ends: 'dump', 'target', 'wall', 'barrier', 'nohd' (hazard ends), 'open' (still hazardous at the plan's edge). */
  readonly endsAt: 'dump' | 'target' | 'wall' | 'barrier' | 'nohd';
  readonly endDetail: string;
}

export type PlanFindingKind =
  | 'door-in-zone'
  | 'window-in-zone'
  | 'work-position-in-zone'
  | 'leaves-enclosure'
  | 'leaves-room'
  | 'stopped-by-barrier'
  | 'passes-surface-end'
  | 'wider-than-dump'
  | 'beam-at-eye-level'
  | 'outside-controlled-area'
  | 'no-controlled-area'
  | 'no-diffuse-distance'
  | 'path-not-placed'
  | 'path-meets-wall';

export interface PlanFinding {
  readonly kind: PlanFindingKind;
  /** 'hazard': a person can be exposed above the limit; 'check': the officer must confirm something. */
  readonly severity: 'hazard' | 'check';
  /** Id of the door, window, work position, enclosure, barrier or laser the finding is about. */
  readonly subjectId: string;
  readonly zoneIds: readonly string[];
  /** One sentence in officer words. */
  readonly text: string;
  /** The control the finding suggests, one sentence (empty when none). */
  readonly suggestion: string;
}

export interface PlanResult {
  readonly zones: readonly PlanZone[];
  readonly runs: readonly PlanBeamRun[];
  readonly findings: readonly PlanFinding[];
  /** The suggestions of the findings, without repeats, in finding order. */
  readonly suggestions: readonly string[];
  /** How the zones were drawn (margins, rounding), one sentence each, for the report. */
  readonly method: readonly string[];
}
