import type { TDutyCycleInput } from "@/lib/scrub/schemas";

/** Invented demo duty cycles (pure data), keyed by demo machine id. Speeds in m/s. */
export const DEMO_DUTY_CYCLES: Readonly<Record<string, TDutyCycleInput>> = {
  "row-crop-tractor": {
    name: "Row-crop headlands with yard and road work",
    turns: [
      {
        turn: {
          label: "headland U-turn (left)",
          direction: "left",
          radius: 6,
          headingChange: 180,
          speed: 2,
          surface: "firm-soil",
        },
        perHour: 18,
      },
      {
        turn: {
          label: "headland U-turn (right)",
          direction: "right",
          radius: 6,
          headingChange: 180,
          speed: 2,
          surface: "firm-soil",
        },
        perHour: 18,
      },
      {
        turn: {
          label: "yard corner, assist off",
          direction: "left",
          radius: 8,
          headingChange: 90,
          speed: 1.5,
          surface: "concrete-asphalt",
          frontDrive: "disengaged",
        },
        perHour: 6,
      },
      {
        turn: {
          label: "yard corner, assist on",
          direction: "right",
          radius: 8,
          headingChange: 90,
          speed: 1.5,
          surface: "concrete-asphalt",
        },
        perHour: 3,
      },
      {
        turn: {
          label: "road junction",
          direction: "left",
          radius: 15,
          headingChange: 90,
          speed: 4,
          surface: "concrete-asphalt",
          frontDrive: "disengaged",
        },
        perHour: 2,
      },
      {
        turn: {
          label: "tight yard turn",
          direction: "left",
          radius: 2.5,
          headingChange: 90,
          speed: 1,
          surface: "concrete-asphalt",
        },
        perHour: 1,
      },
    ],
    straight: {
      distancePerHour: 6000,
      speed: 2.2,
      surfaceShares: { "firm-soil": 0.75, "concrete-asphalt": 0.25 },
      frontDrive: "disengaged",
    },
  },
  "articulated-loader": {
    name: "Stockpile loading into trucks",
    turns: [
      {
        turn: {
          label: "reverse out of pile",
          direction: "left",
          radius: 6.5,
          headingChange: 90,
          speed: 1.5,
          surface: "gravel",
          loadState: "laden",
        },
        perHour: 40,
      },
      {
        turn: {
          label: "approach truck",
          direction: "right",
          radius: 6.5,
          headingChange: 90,
          speed: 1.5,
          surface: "gravel",
        },
        perHour: 40,
      },
    ],
    straight: {
      distancePerHour: 3000,
      speed: 2,
      surfaceShares: { gravel: 1 },
      ladenShare: 0.5,
    },
  },
  "wheeled-skid-steer": {
    name: "Yard clean-out",
    turns: [
      {
        turn: {
          label: "pivot turn",
          direction: "left",
          radius: 0,
          headingChange: 180,
          speed: 0,
          surface: "concrete-asphalt",
        },
        perHour: 25,
      },
      {
        turn: {
          label: "pivot turn",
          direction: "right",
          radius: 0,
          headingChange: 180,
          speed: 0,
          surface: "concrete-asphalt",
          loadState: "laden",
        },
        perHour: 25,
      },
      {
        turn: {
          label: "tight arc",
          direction: "left",
          radius: 2,
          headingChange: 90,
          speed: 1.5,
          surface: "concrete-asphalt",
        },
        perHour: 60,
      },
    ],
    straight: {
      distancePerHour: 2500,
      speed: 2,
      surfaceShares: { "concrete-asphalt": 0.8, gravel: 0.2 },
    },
  },
  telehandler: {
    name: "Bale stacking and yard loading",
    turns: [
      {
        turn: {
          label: "four-wheel-steer U-turn",
          direction: "left",
          radius: 4,
          headingChange: 180,
          speed: 1.5,
          surface: "gravel",
          steeringMode: "four-wheel",
        },
        perHour: 10,
      },
      {
        turn: {
          label: "two-wheel-steer corner",
          direction: "right",
          radius: 8,
          headingChange: 90,
          speed: 2,
          surface: "concrete-asphalt",
          steeringMode: "ideal",
        },
        perHour: 20,
      },
      {
        turn: {
          label: "crab along stack",
          direction: "left",
          steerInput: 20,
          headingChange: 0,
          crabDistance: 15,
          speed: 1,
          surface: "concrete-asphalt",
          steeringMode: "crab",
        },
        perHour: 6,
      },
    ],
    straight: {
      distancePerHour: 3000,
      speed: 2,
      surfaceShares: { "concrete-asphalt": 0.6, gravel: 0.4 },
      ladenShare: 0.4,
    },
  },
  "rear-steer-combine": {
    name: "Cereal harvest",
    turns: [
      {
        turn: {
          label: "headland turn",
          direction: "left",
          radius: 7,
          headingChange: 180,
          speed: 1.5,
          surface: "firm-soil",
          loadState: "laden",
        },
        perHour: 12,
      },
      {
        turn: {
          label: "road corner",
          direction: "right",
          radius: 20,
          headingChange: 90,
          speed: 5,
          surface: "concrete-asphalt",
          differentialLock: false,
        },
        perHour: 1,
      },
    ],
    straight: {
      distancePerHour: 5000,
      speed: 1.8,
      surfaceShares: { "firm-soil": 0.9, "concrete-asphalt": 0.1 },
      ladenShare: 0.5,
    },
  },
  "turntable-wagon": {
    name: "Feed passage rounds",
    turns: [
      {
        turn: {
          label: "feed passage end",
          direction: "left",
          radius: 7,
          headingChange: 90,
          speed: 1.5,
          surface: "concrete-asphalt",
          loadState: "laden",
        },
        perHour: 20,
      },
      {
        turn: {
          label: "yard return",
          direction: "right",
          radius: 9,
          headingChange: 180,
          speed: 2,
          surface: "concrete-asphalt",
        },
        perHour: 4,
      },
    ],
    straight: {
      distancePerHour: 4000,
      speed: 1.8,
      surfaceShares: { "concrete-asphalt": 1 },
      ladenShare: 0.5,
    },
  },
};
