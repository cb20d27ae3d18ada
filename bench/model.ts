/**
 * Speed of the WOT solver: operating-point solves per second for a 20-row engine table, against the
 * closed-form constant-torque swap (swapFromKnownPoint) in the same run. Demo numbers, invented.
 * Run: node --import tsx bench/model.ts
 */
import { pathToFileURL } from 'node:url';
import {
  engineCurve,
  makeAbsorber,
  operatingPoint,
  swapFromKnownPoint,
  type Absorber,
  type EngineSpec,
  type ImpellerFamilySpec,
} from '../src/model/index.ts';

/** An invented 20-row petrol curve: power rising to a peak near 6000 rpm, falling a little after. */
function benchEngine(): EngineSpec {
  const points = Array.from({ length: 20 }, (_, i) => {
    const speedRpm = 1000 + i * 300;
    const x = speedRpm / 6000;
    return { speedRpm, powerKw: 220 * x * (1.6 - 0.6 * x * x) };
  });
  return {
    id: 'bench/demo',
    label: 'Bench demo engine (invented)',
    fuel: 'petrol',
    aspiration: 'natural',
    curve: { kind: 'table', points },
    limits: { idleRpm: 800, windowLowRpm: 5400, windowHighRpm: 6000, maxRpm: 6500 },
    powerTolerancePct: 5,
    referenceAmbient: { pressureKpa: 100, airTempC: 25, relativeHumidityPct: 30 },
    conditionFactor: 1,
  };
}

const family: ImpellerFamilySpec = { referenceSpeedRpm: 1000, exponent: 3, tolerancePct: 5, referenceDensityKgM3: 1025 };

/** Calls per second of fn(i) over about `seconds` (after a warm-up); the sink defeats dead-code removal. */
function rate(fn: (i: number) => number, seconds: number): { perSecond: number; sink: number } {
  let sink = 0;
  for (let i = 0; i < 20000; i++) sink += fn(i); // warm up the JIT
  let calls = 0;
  const start = performance.now();
  let elapsedMs = 0;
  while (elapsedMs < seconds * 1000) {
    for (let i = 0; i < 10000; i++) sink += fn(calls + i);
    calls += 10000;
    elapsedMs = performance.now() - start;
  }
  return { perSecond: (calls / elapsedMs) * 1000, sink };
}

/** Best rate of each over interleaved rounds, so a busy machine slows both alike and bursts do not decide. */
function bestRates(fns: readonly ((i: number) => number)[], rounds: number, seconds: number): { perSecond: number; sink: number }[] {
  const best = fns.map(() => ({ perSecond: 0, sink: 0 }));
  for (let r = 0; r < rounds; r++) {
    fns.forEach((fn, j) => {
      const got = rate(fn, seconds);
      best[j] = { perSecond: Math.max(best[j].perSecond, got.perSecond), sink: best[j].sink + got.sink };
    });
  }
  return best;
}

/** Lines to print: solves per second and the ratio to the closed form. */
export async function runModelBench(): Promise<string[]> {
  const curve = engineCurve(benchEngine());
  // 64 impellers from light (rev-limited) to heavy (below window) so every branch is exercised.
  const absorbers: Absorber[] = Array.from({ length: 64 }, (_, i) =>
    makeAbsorber({
      family,
      impeller: { id: `i${i}`, label: `i${i}`, ratingKw: 0.6 + i * 0.02 },
      driveLine: { ratio: 1, efficiency: 0.97 },
      waterDensityKgM3: 1025,
    }),
  );
  const limits = benchEngine().limits;
  const [solve, closed] = bestRates(
    [
      (i) => operatingPoint({ curve, absorber: absorbers[i & 63], limits }).speedRpm,
      (i) => swapFromKnownPoint({ knownRpm: 5800, knownPowerKw: 210, fromRatingKw: 1, toRatingKw: 0.6 + (i & 63) * 0.02, exponent: 3 }).speedRpm,
    ],
    5,
    0.4,
  );
  // Using the sums keeps the optimiser from dropping the work it would otherwise see as unused.
  if (!Number.isFinite(solve.sink + closed.sink)) throw new Error('bench/model.ts: a solve returned a non-finite speed');
  const fmt = (x: number) => Math.round(x).toLocaleString('en-US');
  return [
    `model: operatingPoint, 20-row table: ${fmt(solve.perSecond)} solves/s (best of 5 rounds; goal ≥ 1,000,000)`,
    `model: constant-torque closed form:  ${fmt(closed.perSecond)} solves/s`,
    `model: closed form / table solve = ${(closed.perSecond / solve.perSecond).toFixed(1)}× (goal ≤ 10×)`,
  ];
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  for (const line of await runModelBench()) console.log(line);
}
