/**
 * The hoist shoe-brake sheet written as plain arithmetic, for the benchmark only: the same
 * formulas as the sheet (demo arrangement: short-shoe torque model, two brakes, hot metal with
 * power control braking, both disc-spring stacks, levers checked), numbers in SI, no units, no
 * steps, no text. `npm run bench` divides the sheet's evaluation time by this one's;
 * plain-hoist.test.ts holds its results to the sheet's, so the two cannot drift apart.
 * Not a second calculation core: it covers only the branches the demo duty takes.
 */

/** The hoist sheet's inputs in SI (angles in rad, speeds in rad/s, temperatures in K). */
export interface PlainHoistInputs {
  motorPower: number;
  motorSpeed: number;
  load: number;
  hookBlock: number;
  ropeDrumDiameter: number;
  reeving: number;
  gearRatio: number;
  efficiency: number;
  motorInertia: number;
  brakeDrumInertia: number;
  gearInertia: number;
  ropeDrumInertia: number;
  backDrivingEfficiency: number;
  setDelay: number;
  motorMaxSpeed: number;
  maxStoppingDistance: number;
  drumDiameter: number;
  shoeWidth: number;
  contactAngle: number;
  springForce: number;
  springRate: number;
  springFreeLength: number;
  springForceMin: number;
  springForceMax: number;
  springRelaxation: number;
  leverRatio: number;
  linkageEfficiency: number;
  maxBrakeTorque: number;
  springWireDiameter: number;
  springMeanDiameter: number;
  springActiveCoils: number;
  springShearModulus: number;
  springElasticModulus: number;
  springEndFixity: number;
  springAllowableShear: number;
  muNominal: number;
  muMin: number;
  muMax: number;
  liningThickness: number;
  liningMinThickness: number;
  drumWearAllowance: number;
  springTravelRatio: number;
  drumMaxSpeed: number;
  /** Stops per second, service and emergency together. */
  stopsPerSecond: number;
  drumMass: number;
  specificHeat: number;
  coolingCoefficient: number;
  coolingArea: number;
  ambient: number;
  thrusterTravelRatio: number;
  releaseEfficiency: number;
  thrusterForce: number;
  thrusterFactorLowVoltage: number;
  thrusterFactorCold: number;
  thrusterFactorHot: number;
  thrusterStroke: number;
  reserveStroke: number;
  minReserveStroke: number;
  holder: PlainStackInputs;
  equaliser: PlainStackInputs;
  holderRequiredPreload: number;
  discE: number;
  discNu: number;
  discFrictionEdge: number;
  discFrictionCone: number;
  leverMomentArm: number;
  leverSectionWidth: number;
  leverSectionDepth: number;
  leverAllowableBending: number;
  shoePinDiameter: number;
  shoePinBearingLength: number;
  shoePinAllowableShear: number;
  shoePinAllowableBearing: number;
  baseBoltRowSpacing: number;
  baseBoltsPerRow: number;
  baseBoltAllowableLoad: number;
  /** Criteria and lining data the sheet looks up, as numbers. */
  torqueFactor: number;
  maxPeakPressure: number;
  maxMeanPressure: number;
  maxPv: number;
  maxLiningTemperature: number;
  thrusterMargin: number;
  springSolidMargin: number;
  springRateTolerance: number;
  travelRatioTolerance: number;
  discSigmaOMFlatMax: number;
}

export interface PlainStackInputs {
  De: number;
  Di: number;
  t: number;
  l0: number;
  series: number;
  parallel: number;
  pitch: number;
  backOff: number;
  backOffTolerance: number;
}

export interface PlainHoistResults {
  motorTorque: number;
  requiredTorque: number;
  torqueNominal: number;
  torqueMin: number;
  torqueMax: number;
  torqueWornMin: number;
  torqueDrumLimit: number;
  stoppingDistance: number;
  stoppingTime: number;
  peakTemperature: number;
  thrusterForceRatio: number;
  springShearStress: number;
  holderPreload: number;
  equaliserPreload: number;
  baseBoltTension: number;
  /** Every check's value, limit and utilisation, by the sheet's check id. */
  checks: Record<string, [value: number, limit: number, utilisation: number]>;
  pass: boolean;
}

const maxU = (value: number, limit: number): [number, number, number] => [
  value,
  limit,
  Math.abs(value / limit),
];
const minU = (value: number, limit: number): [number, number, number] => [
  value,
  limit,
  Math.abs(limit / value),
];

/** One disc-spring stack set flat, then backed off by `angle` (DIN EN 16984 relations, K4 = 1). */
function stackSet(x: PlainHoistInputs, s: PlainStackInputs, angle: number) {
  const delta = s.De / s.Di;
  const ln = Math.log(delta);
  const K1 = ((1 / Math.PI) * ((delta - 1) / delta) ** 2) / ((delta + 1) / (delta - 1) - 2 / ln);
  const K2 = ((6 / Math.PI) * ((delta - 1) / ln - 1)) / ln;
  const K3 = ((3 / Math.PI) * (delta - 1)) / ln;
  const t = s.t;
  const h0 = s.l0 - t;
  const release = s.pitch * (angle / (2 * Math.PI));
  const sd = Math.max(h0 - release / s.series, 0);
  const E4 = (4 * x.discE) / (1 - x.discNu * x.discNu);
  const force = (sx: number) =>
    ((E4 * t ** 4) / (K1 * s.De * s.De)) *
    (sx / t) *
    ((h0 / t - sx / t) * (h0 / t - sx / (2 * t)) + 1);
  const friction = x.discFrictionCone * (s.parallel - 1) + x.discFrictionEdge;
  const Fn = s.parallel * force(sd);
  const sigmaOM = (sx: number) => (-((E4 * t * t) / (K1 * s.De * s.De)) * (sx / t) * 3) / Math.PI;
  return {
    K2,
    K3,
    delta,
    h0,
    setRatio: sd / h0,
    preload: Fn / (1 + friction),
    sigmaOMFlat: sigmaOM(h0),
    setLength: s.series * (s.l0 + (s.parallel - 1) * t) - s.series * sd,
  };
}

/** The hoist sheet's values and checks, plain. */
export function plainHoist(x: PlainHoistInputs): PlainHoistResults {
  const w = x.motorSpeed;
  // Duty.
  const denom = 2 * x.reeving * x.gearRatio;
  const ML = ((x.load + x.hookBlock) * 9.80665 * x.ropeDrumDiameter) / denom;
  const Mhoist = ML / x.efficiency;
  const vL = (w * x.ropeDrumDiameter) / denom;
  const wOut = w / x.gearRatio;
  const J =
    x.motorInertia +
    x.brakeDrumInertia +
    x.gearInertia +
    x.ropeDrumInertia * (wOut / w) ** 2 +
    (x.load + x.hookBlock) * (vL / w) ** 2;
  const Mreq = x.torqueFactor * Mhoist;
  const Md = ML * x.backDrivingEfficiency;
  // Torque.
  const r = x.drumDiameter / 2;
  const N = x.springForce * x.leverRatio * x.linkageEfficiency;
  const Mnom = 2 * x.muNominal * N * r;
  const Mmin = 2 * x.muMin * N * r;
  const Mmax = 2 * x.muMax * N * r;
  // Stroke and wear chain.
  const eps = (x.thrusterStroke - x.reserveStroke) / x.thrusterTravelRatio;
  const wAdj = (x.reserveStroke - x.minReserveStroke) / x.thrusterTravelRatio;
  const Fw = x.springForce * (1 - x.springRelaxation) - x.springRate * wAdj * x.springTravelRatio;
  const Nw = Fw * x.leverRatio * x.linkageEfficiency;
  const MwMin = 2 * x.muMin * Nw * r;
  // Lining.
  const th2 = x.contactAngle / 2;
  const shape = 2 * th2 + Math.sin(2 * th2);
  const pPeak = (2 * N) / (x.shoeWidth * r * shape);
  const pMean = N / (x.shoeWidth * x.drumDiameter * Math.sin(th2));
  const wearAllowance = x.liningThickness - x.liningMinThickness;
  const Mlow = (MwMin * (x.drumDiameter - x.drumWearAllowance)) / x.drumDiameter;
  // Stop with the lowest torque in service.
  const aD = Md / J;
  const w1 = w + aD * x.setDelay;
  const aB = (Mlow - Md) / J;
  const tB = w1 / aB;
  const phi = ((w + w1) / 2) * x.setDelay + (w1 * tB) / 2;
  const sStop = (phi * vL) / w;
  const Estop = (Mlow * w1 * tB) / 2;
  // Highest torque the drive train sees (long-shoe model, no linkage losses).
  const a = (4 * r * Math.sin(th2)) / shape;
  const MmaxAdj = (2 * a * x.muMax * N * (x.springForceMax / x.springForce)) / x.linkageEfficiency;
  const Mtrain = 2 * MmaxAdj;
  const travelDev = x.springTravelRatio / (2 * x.leverRatio) - 1;
  // At the moment the brake sets.
  const vSet = (w1 * x.drumDiameter) / 2;
  const pvSet = pMean * vSet;
  // Heat.
  const Pavg = x.stopsPerSecond * Estop;
  const hA = x.coolingCoefficient * x.coolingArea;
  const Tss = x.ambient + Pavg / hA;
  const tau = (x.drumMass * x.specificHeat) / hA;
  const dT = Estop / (x.drumMass * x.specificHeat);
  const Tpeak = x.ambient + dT / (1 - Math.exp(-1 / (x.stopsPerSecond * tau)));
  const tempU = (T: number): [number, number, number] => [
    T,
    x.maxLiningTemperature,
    Math.abs((T - x.ambient) / (x.maxLiningTemperature - x.ambient)),
  ];
  // Main spring.
  const Fhigh = x.springForceMax + x.springRate * eps * x.springTravelRatio;
  const d = x.springWireDiameter;
  const D = x.springMeanDiameter;
  const C = D / d;
  const KB = (4 * C + 2) / (4 * C - 3);
  const kGeo = (d ** 4 * x.springShearModulus) / (8 * D ** 3 * x.springActiveCoils);
  const Lsolid = d * (x.springActiveCoils + 2);
  const Fsolid = kGeo * (x.springFreeLength - Lsolid);
  const tauOf = (F: number) => (KB * 8 * F * D) / (Math.PI * d ** 3);
  const G = x.springShearModulus;
  const E = x.springElasticModulus;
  const L0cr = ((Math.PI * D) / x.springEndFixity) * Math.sqrt((2 * (E - G)) / (2 * G + E));
  // Release.
  const Frel = x.springForce + x.springRate * eps * x.springTravelRatio;
  const nTh =
    x.thrusterForce /
    ((Frel * x.springTravelRatio) / (x.thrusterTravelRatio * x.releaseEfficiency));
  // Disc springs, at the set angle and at both ends of its tolerance.
  const hs = stackSet(x, x.holder, x.holder.backOff);
  const hShort = stackSet(x, x.holder, Math.max(0, x.holder.backOff - x.holder.backOffTolerance));
  const hPast = stackSet(x, x.holder, x.holder.backOff + x.holder.backOffTolerance);
  const es = stackSet(x, x.equaliser, x.equaliser.backOff);
  const eShort = stackSet(
    x,
    x.equaliser,
    Math.max(0, x.equaliser.backOff - x.equaliser.backOffTolerance),
  );
  const ePast = stackSet(x, x.equaliser, x.equaliser.backOff + x.equaliser.backOffTolerance);
  // Levers, pins, base bolts.
  const sigmaLever =
    (6 * Fhigh * x.leverMomentArm) / (x.leverSectionWidth * x.leverSectionDepth ** 2);
  const Fp = x.leverRatio * Fhigh * Math.sqrt(1 + x.muMax * x.muMax);
  const Fbolt = MmaxAdj / (x.baseBoltRowSpacing * x.baseBoltsPerRow);

  const checks: PlainHoistResults['checks'] = {
    'holding-brakes-installed': minU(2, 2),
    'each-brake-holds-alone': minU(Mlow, Mhoist),
    // Each brake alone stopping the load is the sheet's own stop here (η_bd = 1): checked once.
    'torque-nominal': minU(Mnom, Mreq),
    'torque-min-friction': minU(Mmin, Mreq),
    'torque-worn-min-friction': minU(MwMin, Mreq),
    'lining-peak-pressure': maxU(pPeak, x.maxPeakPressure),
    'lining-mean-pressure': maxU(pMean, x.maxMeanPressure),
    'torque-drum-wear-limit': minU(Mlow, Mreq),
    'lining-wear-allowance': minU(wearAllowance, wAdj),
    'torque-max-friction': maxU(Mtrain, x.maxBrakeTorque),
    'spring-travel-ratio-geometry': maxU(Math.abs(travelDev), x.travelRatioTolerance),
    'rubbing-speed': maxU(vSet, x.drumMaxSpeed),
    pv: maxU(pvSet, x.maxPv),
    'stops-load': minU(Mlow, Md),
    'motor-overspeed': maxU(w1, x.motorMaxSpeed),
    'stopping-distance': maxU(sStop, x.maxStoppingDistance),
    'temperature-steady': tempU(Tss),
    'temperature-peak': tempU(Tpeak),
    'spring-stress-working': maxU(tauOf(Fhigh), x.springAllowableShear),
    'spring-stress-solid': maxU(tauOf(Fsolid), x.springAllowableShear),
    'spring-solid-margin': minU(Fsolid, x.springSolidMargin * Fhigh),
    'spring-buckling': maxU(x.springFreeLength, L0cr),
    'spring-rate-agrees': maxU(Math.abs(kGeo / x.springRate - 1), x.springRateTolerance),
    'thruster-force': minU(nTh, x.thrusterMargin),
    'thruster-force-low-voltage': minU(nTh * x.thrusterFactorLowVoltage, x.thrusterMargin),
    'thruster-force-cold': minU(nTh * x.thrusterFactorCold, x.thrusterMargin),
    'thruster-force-hot': minU(nTh * x.thrusterFactorHot, x.thrusterMargin),
    'reserve-stroke-set': minU(x.reserveStroke, x.minReserveStroke),
    'spring-setting-max': maxU(x.springForce, x.springForceMax),
    'spring-setting-min': minU(x.springForce, x.springForceMin),
    'holder-set-deflection-min': minU(hs.setRatio, 0.15),
    'holder-set-deflection-max': maxU(hs.setRatio, 0.75),
    'holder-band-short': maxU(hShort.setRatio, 0.75),
    'holder-band-past': minU(hPast.setRatio, 0.15),
    'holder-sigma-om-flat': maxU(Math.abs(hs.sigmaOMFlat), x.discSigmaOMFlatMax),
    'holder-preload-needed': minU(hPast.preload, x.holderRequiredPreload),
    'equaliser-set-deflection-min': minU(es.setRatio, 0.15),
    'equaliser-set-deflection-max': maxU(es.setRatio, 0.75),
    'equaliser-band-short': maxU(eShort.setRatio, 0.75),
    'equaliser-band-past': minU(ePast.setRatio, 0.15),
    'equaliser-sigma-om-flat': maxU(Math.abs(es.sigmaOMFlat), x.discSigmaOMFlatMax),
    'lever-bending': maxU(sigmaLever, x.leverAllowableBending),
    'pin-shear': maxU(Fp / ((2 * Math.PI * x.shoePinDiameter ** 2) / 4), x.shoePinAllowableShear),
    'pin-bearing': maxU(
      Fp / (x.shoePinDiameter * x.shoePinBearingLength),
      x.shoePinAllowableBearing,
    ),
    'base-bolt-tension': maxU(Fbolt, x.baseBoltAllowableLoad),
  };
  let pass = true;
  for (const id in checks) if (checks[id]![2] > 1) pass = false; // id comes from checks itself
  return {
    motorTorque: x.motorPower / w,
    requiredTorque: Mreq,
    torqueNominal: Mnom,
    torqueMin: Mmin,
    torqueMax: Mmax,
    torqueWornMin: MwMin,
    torqueDrumLimit: Mlow,
    stoppingDistance: sStop,
    stoppingTime: x.setDelay + tB,
    peakTemperature: Tpeak,
    thrusterForceRatio: nTh,
    springShearStress: tauOf(Fhigh),
    holderPreload: hs.preload,
    equaliserPreload: es.preload,
    baseBoltTension: Fbolt,
    checks,
    pass,
  };
}

const rpm = (n: number) => (n * 2 * Math.PI) / 60;
const deg = (a: number) => (a * Math.PI) / 180;

/** The demo hoist duty (invented demo data, the sheet's demo values) in SI, with its criteria. */
export const PLAIN_DEMO_HOIST: PlainHoistInputs = {
  motorPower: 22_000,
  motorSpeed: rpm(975),
  load: 10_000,
  hookBlock: 300,
  ropeDrumDiameter: 0.5,
  reeving: 4,
  gearRatio: 40,
  efficiency: 0.88,
  motorInertia: 0.45,
  brakeDrumInertia: 1.2,
  gearInertia: 0.05,
  ropeDrumInertia: 30,
  backDrivingEfficiency: 1,
  setDelay: 0.3,
  motorMaxSpeed: rpm(2200),
  maxStoppingDistance: 0.25,
  drumDiameter: 0.4,
  shoeWidth: 0.15,
  contactAngle: deg(70),
  springForce: 1150,
  springRate: 40_000,
  springFreeLength: 0.25,
  springForceMin: 500,
  springForceMax: 1600,
  springRelaxation: 0.02,
  leverRatio: 2.5,
  linkageEfficiency: 0.95,
  maxBrakeTorque: 1600,
  springWireDiameter: 0.01,
  springMeanDiameter: 0.0525,
  springActiveCoils: 17,
  springShearModulus: 79_300e6,
  springElasticModulus: 206_000e6,
  springEndFixity: 0.5,
  springAllowableShear: 600e6,
  muNominal: 0.38,
  muMin: 0.3,
  muMax: 0.45,
  liningThickness: 0.008,
  liningMinThickness: 0.003,
  drumWearAllowance: 0.004,
  springTravelRatio: 5,
  drumMaxSpeed: 30,
  stopsPerSecond: 60 / 3600,
  drumMass: 60,
  specificHeat: 460,
  coolingCoefficient: 20,
  coolingArea: 0.6,
  ambient: 303.15,
  thrusterTravelRatio: 25,
  releaseEfficiency: 0.9,
  thrusterForce: 500,
  thrusterFactorLowVoltage: 0.95,
  thrusterFactorCold: 0.85,
  thrusterFactorHot: 0.95,
  thrusterStroke: 0.05,
  reserveStroke: 0.02,
  minReserveStroke: 0.005,
  holder: {
    De: 0.04,
    Di: 0.0204,
    t: 0.0015,
    l0: 0.00265,
    series: 1,
    parallel: 1,
    pitch: 0.0025,
    backOff: deg(60),
    backOffTolerance: deg(15),
  },
  equaliser: {
    De: 0.04,
    Di: 0.0204,
    t: 0.0015,
    l0: 0.00265,
    series: 3,
    parallel: 1,
    pitch: 0.002,
    backOff: deg(240),
    backOffTolerance: deg(30),
  },
  holderRequiredPreload: 1500,
  discE: 206_000e6,
  discNu: 0.3,
  discFrictionEdge: 0.02,
  discFrictionCone: 0.015,
  leverMomentArm: 0.15,
  leverSectionWidth: 0.012,
  leverSectionDepth: 0.04,
  leverAllowableBending: 160e6,
  shoePinDiameter: 0.016,
  shoePinBearingLength: 0.025,
  shoePinAllowableShear: 80e6,
  shoePinAllowableBearing: 25e6,
  baseBoltRowSpacing: 0.2,
  baseBoltsPerRow: 2,
  baseBoltAllowableLoad: 8000,
  // General-industry criteria set and the demo lining (non-asbestos, rigid moulded).
  torqueFactor: 1,
  maxPeakPressure: 3.8e6,
  maxMeanPressure: 0.7e6,
  maxPv: 2.1e6,
  maxLiningTemperature: 498.15,
  thrusterMargin: 1.1,
  springSolidMargin: 1.15,
  springRateTolerance: 0.05,
  travelRatioTolerance: 0.03,
  discSigmaOMFlatMax: 1600e6,
};
