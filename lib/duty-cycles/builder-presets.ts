/** Invented starting points for the builder; every figure is an example, not advice. */
import type { TBuilderInput } from "@/lib/duty-cycles/builder";

const KMH = 1 / 3.6;

export const BUILDER_PRESETS: {
  key: string;
  name: string;
  description: string;
  input: TBuilderInput;
}[] = [
  {
    key: "row-crop-cultivating",
    name: "Row-crop tractor cultivating, 6 m implement",
    description:
      "12 km/h on 400 m runs with bulb headland turns, plus an hour in eight on the road.",
    input: {
      minTurningRadius: 5.5,
      blocks: [
        {
          kind: "field",
          label: "Cultivating",
          share: 0.85,
          surface: "loose-soil",
          runLength: 400,
          workingWidth: 6,
          workingSpeed: 12 * KMH,
          turnSpeed: 6 * KMH,
          headlandTurn: "bulb",
          laden: false,
        },
        {
          kind: "road",
          label: "Road between fields",
          share: 0.15,
          surface: "concrete-asphalt",
          speed: 30 * KMH,
          bendShare: 0.1,
          bendRadius: 40,
          bendAngle: 60,
          laden: false,
        },
      ],
    },
  },
  {
    key: "yard-loader",
    name: "Yard loader, 40 cycles per hour",
    description:
      "Loading trailers from a clamp on concrete: reverse out and swing in, twice a cycle.",
    input: {
      minTurningRadius: 4,
      blocks: [
        {
          kind: "yard",
          label: "Loading cycle",
          share: 1,
          surface: "concrete-asphalt",
          cyclesPerHour: 40,
          turns: [
            { headingChange: 90, radius: 4.5, reverse: true, laden: true },
            { headingChange: 90, radius: 5, reverse: false, laden: true },
            { headingChange: 90, radius: 4.5, reverse: true, laden: false },
            { headingChange: 90, radius: 5, reverse: false, laden: false },
          ],
          travelPerCycle: 30,
          speed: 8 * KMH,
        },
      ],
    },
  },
  {
    key: "estate-mixed",
    name: "Estate tractor, mowing, yard and road",
    description: "Grass mowing with 3 m loop turns, yard work and road haulage mixed by hours.",
    input: {
      minTurningRadius: 4.5,
      blocks: [
        {
          kind: "field",
          label: "Mowing",
          share: 0.5,
          surface: "grass",
          runLength: 180,
          workingWidth: 9,
          workingSpeed: 10 * KMH,
          turnSpeed: 7 * KMH,
          headlandTurn: "loop",
          laden: false,
        },
        {
          kind: "yard",
          label: "Yard handling",
          share: 0.2,
          surface: "gravel",
          cyclesPerHour: 20,
          turns: [
            { headingChange: 90, radius: 6, reverse: true, laden: false },
            { headingChange: 120, radius: 7, reverse: false, laden: true },
          ],
          travelPerCycle: 60,
          speed: 10 * KMH,
        },
        {
          kind: "road",
          label: "Haulage",
          share: 0.3,
          surface: "concrete-asphalt",
          speed: 35 * KMH,
          bendShare: 0.08,
          bendRadius: 50,
          bendAngle: 70,
          laden: true,
        },
      ],
    },
  },
];
