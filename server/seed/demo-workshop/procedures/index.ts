import type { ProcedureDocument } from '@shared/engine/procedure';
import { batteryDrainParked } from './battery-drain-parked';
import { headlightDead, headlightDeadDraft } from './headlight-dead';
import { noSparkTwinCdi } from './no-spark-twin-cdi';
import { notChargingThreePhase } from './not-charging-three-phase';
import { starterNoEngage, starterNoEngageV1 } from './starter-no-engage';

/** Demo content: the invented demo shop's procedures, their machines and their version history. */

/** One stored version. Published and retired ones are numbered in the order given; a draft comes last. */
export interface DemoVersion {
  status: 'published' | 'retired' | 'draft';
  document: ProcedureDocument;
  /** Published (or, for a draft, last saved) this many days before seeding. */
  daysAgo: number;
  /** Retired this many days before seeding. */
  retiredDaysAgo?: number;
  /** Saved edits of a draft so far. */
  revision?: number;
}

export interface DemoProcedure {
  key: DemoProcedureKey;
  title: string;
  complaint: string;
  family: string;
  createdDaysAgo: number;
  versions: DemoVersion[];
}

export type DemoProcedureKey = 'no-spark' | 'not-charging' | 'starter' | 'drain' | 'headlight';

export const DEMO_PROCEDURES: readonly DemoProcedure[] = [
  {
    key: 'no-spark',
    title: 'Cranks, no spark — twin CDI ignition',
    complaint: 'Cranks but no spark',
    family: 'Veltro Tessa 650 twins, 2012–2017 (carburetted, CDI ignition, one coil per cylinder)',
    createdDaysAgo: 131,
    versions: [{ status: 'published', document: noSparkTwinCdi, daysAgo: 124 }],
  },
  {
    key: 'not-charging',
    title: 'Battery not charging — three-phase stator',
    complaint: 'Battery not charging',
    family: 'Nordane Fellrunner 450 and 570 ATVs, 2015–2022',
    createdDaysAgo: 118,
    versions: [{ status: 'published', document: notChargingThreePhase, daysAgo: 112 }],
  },
  {
    key: 'starter',
    title: 'Starter does not engage — scooter start circuit',
    complaint: 'Starter does not engage',
    family: 'Pippit Wren 125 and 150 scooters, 2016–2023',
    createdDaysAgo: 97,
    versions: [
      { status: 'retired', document: starterNoEngageV1, daysAgo: 93, retiredDaysAgo: 21 },
      { status: 'published', document: starterNoEngage, daysAgo: 21 },
    ],
  },
  {
    key: 'drain',
    title: 'Battery drains when parked',
    complaint: 'Battery goes flat when parked',
    family: 'Veltro Marra 650 twins, 2018–2022 (fuel injected)',
    createdDaysAgo: 75,
    versions: [{ status: 'published', document: batteryDrainParked, daysAgo: 70 }],
  },
  {
    key: 'headlight',
    title: 'Headlight dead on low beam',
    complaint: 'Headlight does not work',
    family: 'Nordane Fellrunner 450 and 570 ATVs, 2015–2022',
    createdDaysAgo: 48,
    versions: [
      { status: 'published', document: headlightDead, daysAgo: 44 },
      { status: 'draft', document: headlightDeadDraft, daysAgo: 2, revision: 3 },
    ],
  },
];

/** The version of a procedure that new diagnoses run: its newest published one. */
export function currentDocument(key: DemoProcedureKey): ProcedureDocument {
  const procedure = DEMO_PROCEDURES.find((p) => p.key === key)!;
  return procedure.versions.filter((v) => v.status === 'published').at(-1)!.document;
}
