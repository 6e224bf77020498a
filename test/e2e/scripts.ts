/**
 * Cases typed by the end-to-end tests, as a person would answer each question. Invented
 * scenarios with invented numbers. Keys are the interview's question ids.
 */
import type { Script } from './interview-driver.js';

/** Case details, units and limit: what every case starts with. */
const CASE: Script = {
  'details.reference': 'E2E-RIDGE-07',
  'details.occurred': '2026-09-14 17:20',
  'details.location': 'Invented Ridge Road, eastbound, before the footbridge',
  'details.investigator': 'E2E tester',
  'details.notes': '',
  units: 'imperial',
  limit: '40',
};

/** A van whose rear-right brake works only partly, front axle share 0.58. */
const VEHICLE: Script = {
  'vehicle.label': 'Unit 1, invented van',
  'vehicle.brakes': 'wheels',
  'vehicle.share': '0.58',
  'vehicle.wheel.fl': 'working',
  'vehicle.wheel.fr': 'working',
  'vehicle.wheel.rl': 'working',
  'vehicle.wheel.rr': 'partly',
  'vehicle.wheel.rr.fraction': '0.4-0.6',
};

/** Four marks, then two surfaces in order of travel, both 3% downhill, to rest. */
const SLIDE_START: Script = {
  'a0.look': 'dark',
  'a0.label': 'van, to rest',
  'a0.count': '4',
  'a0.marks': '73.5 74 72.8 73.1',
  'a0.rule': 'average',
};

const SLIDE_GUIDED: Script = {
  'a0.surfaces': 'several',
  'a0.segcount': '2',
  'a0.seg0.length': '52.5',
  'a0.seg0.label': 'asphalt lane',
  'a0.seg0.drag.source': 'entered',
  'a0.seg0.drag.value': '0.70-0.80',
  'a0.seg0.grade.dir': 'downhill',
  'a0.seg0.grade.pct': '3',
  'a0.seg1.length': '21',
  'a0.seg1.label': 'gravel shoulder',
  'a0.seg1.drag.source': 'entered',
  'a0.seg1.drag.value': '0.45-0.55',
  'a0.seg1.grade.dir': 'downhill',
  'a0.seg1.grade.pct': '3',
};

/**
 * The same two surfaces, labels and grades on one line, in the quick-entry syntax of src/input/,
 * typed straight at the "one surface, or several" question.
 */
const SLIDE_QUICK: Script = {
  'a0.surfaces': '52.5 @0.70-0.80 -3 asphalt lane, 21 @0.45-0.55 -3 gravel shoulder',
};

const SLIDE_END: Script = { 'a0.end': 'rest' };

/** A yaw on a curve banked 4% toward its centre, chord 44 ft, middle ordinate 3 ft 10 in. */
const YAW: Script = {
  'a0.more': 'yes',
  'a1.look': 'yaw',
  'a1.label': 'curve before the bridge',
  'a1.measure': 'ordinate',
  'a1.chord': '44 ft',
  'a1.ordinate': '3 ft 10 in',
  'a1.drag.source': 'entered',
  'a1.drag.value': '0.72 (0.66-0.78)',
  'a1.bank.dir': 'toward',
  'a1.bank.pct': '4',
  'a1.path': 'none',
  'a1.more': 'no',
  'sampling.shape': 'none',
};

/** The two-surface downhill slide with a partly failed brake, and a banked yaw. */
export const TWO_SURFACES_AND_YAW: Script = {
  ...CASE,
  ...VEHICLE,
  ...SLIDE_START,
  ...SLIDE_GUIDED,
  ...SLIDE_END,
  ...YAW,
};

/** The slide alone, answered question by question (the guided path). */
export const SLIDE_ONLY_GUIDED: Script = {
  ...CASE,
  ...VEHICLE,
  ...SLIDE_START,
  ...SLIDE_GUIDED,
  ...SLIDE_END,
  'a0.more': 'no',
  'sampling.shape': 'none',
};

/**
 * The same slide as an experienced investigator enters it (the fast path): Enter for every default and
 * every optional text, the segments on one line (no labels). Same measurements, same figures.
 */
export const SLIDE_ONLY_FAST: Script = {
  'details.reference': 'E2E-RIDGE-07',
  'details.occurred': '',
  'details.location': '',
  'details.investigator': '',
  'details.notes': '',
  units: '',
  limit: '40',
  'vehicle.label': '',
  'vehicle.brakes': 'wheels',
  'vehicle.share': '0.58',
  'vehicle.wheel.fl': '',
  'vehicle.wheel.fr': '',
  'vehicle.wheel.rl': '',
  'vehicle.wheel.rr': 'partly',
  'vehicle.wheel.rr.fraction': '0.4-0.6',
  'a0.look': 'dark',
  'a0.label': '',
  'a0.count': '4',
  'a0.marks': '73.5 74 72.8 73.1',
  'a0.rule': '',
  'a0.surfaces': 'quick',
  'a0.quick': '52.5 @0.70-0.80 -3%, 21 @0.45-0.55 -3%',
  'a0.end': '',
  'a0.more': '',
  'sampling.shape': '',
};

/** The slide's segments on one line with their labels: the same content as SLIDE_GUIDED. */
export const SLIDE_ONLY_QUICK: Script = {
  ...CASE,
  ...VEHICLE,
  ...SLIDE_START,
  ...SLIDE_QUICK,
  ...SLIDE_END,
  'a0.more': 'no',
  'sampling.shape': 'none',
};

/**
 * For the bad-input catalogue: the other numeric questions. An estimated braking efficiency, one
 * surface from test skids, a slide into an obstacle with an estimated end speed; then a metric
 * yaw with a sled drag factor, banked away from the centre, on the centre-of-mass path.
 */
export const OTHER_SOURCES: Script = {
  ...CASE,
  'vehicle.label': '',
  'vehicle.brakes': 'estimate',
  'vehicle.brakes.efficiency': '0.8-0.9',
  'vehicle.brakes.basis': 'inspection',
  'a0.look': 'skip',
  'a0.label': '',
  'a0.count': '2',
  'a0.marks': '2 x 61',
  'a0.rule': 'longest',
  'a0.surfaces': 'one',
  'a0.seg0.drag.source': 'test-skids',
  'a0.seg0.drag.tests': '30/42, 32/47.5',
  // Tests run elsewhere, on a 1% upgrade: the level drag factor takes that 1% off the test ratio.
  'a0.seg0.drag.testWhere': 'elsewhere',
  'a0.seg0.drag.testGrade.dir': 'uphill',
  'a0.seg0.drag.testGrade.pct': '1',
  'a0.seg0.grade.dir': 'uphill',
  'a0.seg0.grade.pct': '2',
  'a0.end': 'speed',
  'a0.end.speed': '15-20',
  'a0.end.basis': 'invented momentum estimate',
  'a0.more': 'yes',
  'a1.look': 'yaw',
  'a1.label': '',
  'a1.measure': 'ordinate',
  'a1.chord': '40',
  'a1.ordinate': '3.2',
  'a1.drag.source': 'sled',
  'a1.drag.weight': '50',
  'a1.drag.pulls': '34 35 33',
  'a1.bank.dir': 'away',
  'a1.bank.pct': '2',
  'a1.path': 'half-track',
  'vehicle.trackWidth': '5.4',
  'a1.more': 'yes',
  'a2.look': 'abs',
  'a2.label': '',
  'a2.count': '1',
  'a2.marks': '55',
  'a2.surfaces': 'one',
  'a2.seg0.drag.source': 'decelerometer',
  'a2.seg0.drag.readings': '0.71 0.69',
  'a2.seg0.grade.dir': 'level',
  'a2.end': 'rest',
  'a2.more': 'yes',
  'a3.look': 'yaw',
  'a3.label': '',
  'a3.measure': 'offsets',
  'a3.offsets.chord': '45',
  'a3.offsets.stations': '10 1.9, 22.5 2.6, 35 1.9',
  'a3.drag.source': 'entered',
  'a3.drag.value': '0.7',
  'a3.bank.dir': 'none',
  'a3.path': 'none',
  'a3.more': 'no',
  'sampling.shape': 'uniform',
  'sampling.samples': '',
  'sampling.seed': '',
};
