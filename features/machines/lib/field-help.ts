/** Plain trade-word help shown under each machine field. */
export const FIELD_HELP: Record<string, string> = {
  name: "What the customer calls the machine, e.g. “the 150 on the loader”.",
  kind: "Type of machine, used for lists and search.",
  wheelbase: "Centre of the front axle to centre of the rear axle, measured on level ground.",
  track: "Centre of the left tyre to centre of the right tyre where they touch the ground.",
  pivotTrack:
    "Distance between the two steering pivots (king pins) where their axes meet the ground. Leave empty to use the track.",
  load: "Weight on this axle with the machine empty but ready for work (weighbridge figure).",
  ladenLoad: "Weight on this axle when carrying a full load or with mounted implements.",
  designation: "Size as moulded on the sidewall, e.g. 480/80R46, 18.4-38 or 12-16.5.",
  rollingCircumference:
    "Distance the tyre rolls in one turn under load, from the tyre maker's data book. Overrides the estimate from the size.",
  overallDiameter: "Overall diameter from the tyre maker's data book; overrides the nominal one.",
  sectionWidth: "Section width from the tyre maker's data book; overrides the nominal one.",
  treadDepthNew: "Lug (tread) depth of a new tyre, measured at the centre of the tread.",
  treadDepthReplace: "Lug depth at which the customer replaces the tyre.",
  price: "Price of one tyre fitted, in your own currency.",
  loadCapacity:
    "Load one tyre may carry at the working pressure and speed, from the tyre maker's load table. Used only to warn.",
  layout: "How the machine steers. The form shows only the measurements this layout needs.",
  maxLock: "Largest angle the inside wheel turns to at full lock, in degrees.",
  armLength: "Steering arm length, from the king pin to the track-rod ball joint.",
  armAngle:
    "Angle of the steering arm, inboard from straight fore-and-aft, with the wheels straight ahead.",
  tieRod: "Whether the track rod sits behind the axle (arms point back) or ahead of it.",
  frontLength: "Centre pivot (hinge) to the centre of the front axle.",
  rearLength: "Centre pivot (hinge) to the centre of the rear axle.",
  maxArticulation: "Largest angle between the front and rear frames at full lock.",
  wheelAngles:
    "Whether the wheels of an axle follow a proper Ackermann layout or turn to equal angles.",
  rearRatio: "How far the rear wheels steer compared with the front; 1 means equally far.",
  running: "Wheels or tracks.",
  contactLength: "Length of track on the ground.",
  effectiveTrackFactor:
    "Allowance for track or tyre slip when skid turning; leave empty for the usual value.",
  driveType: "What drives the wheels.",
  gearRatio:
    "Front-axle turns for one rear-axle turn with the front drive engaged (the axle gearing lead).",
  interAxleRatio: "Front-axle turns per rear-axle turn with a fixed four-wheel drive.",
  drivenAxle: "The axle the engine drives.",
  minTurningRadius:
    "The maker's quoted smallest turning radius to the outside front tyre, if known.",
};
