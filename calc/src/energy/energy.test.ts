import { describe, expect, it } from 'vitest';
import { rotatingEnergy, linearEnergy, potentialEnergy } from './stop-energy.js';
import {
  averageHeat,
  coolingTimeConstant,
  energyPerHour,
  peakCycleTemperature,
  steadyTemperature,
  temperatureHistory,
  temperatureRise,
} from './heat.js';
import { nearlyEqual } from '../testing/expect-close.js';
import {
  area,
  celsius,
  energy,
  frequency,
  heatTransferCoefficient,
  inertia,
  length,
  mass,
  power,
  rpm,
  specificHeat,
  speed,
  temperatureDifference,
  time,
} from '../units/quantities.js';

const close = (a: number, b: number, rel: number) =>
  expect(nearlyEqual(a, b, rel), `${a} vs ${b}`).toBe(true);

describe('stop energy', () => {
  it('Bhandari, Design of Machine Elements, Ex. 12.1 (FOSSEE Scilab companion, book 764): E = 94 956.72 J, T = 3454.36 N·m (±0.01 %)', () => {
    const m = 7200 * Math.PI * 0.5 ** 2 * 0.2;
    const J = inertia(0.5 * m * 0.5 ** 2);
    const w = rpm(350);
    close(rotatingEnergy(J, w), 94_956.72, 1e-4);
    close((J * w) / 1.5, 3454.36, 1e-4);
  });
  it('½mv² and m·g·h', () => {
    close(linearEnergy(mass(1000), speed(2)), 2000, 1e-12);
    close(potentialEnergy(mass(10), length(2), 9.8), 196, 1e-12);
  });
});

describe('heat', () => {
  it('OpenStax College Physics, Example 14.2: 10 000 kg truck down 75 m into 100 kg of brake at 800 J/(kg·°C): ΔT = 91.875 °C', () => {
    const E = potentialEnergy(mass(10_000), length(75), 9.8);
    close(temperatureRise(E, mass(100), specificHeat(800)), 91.875, 1e-9);
  });
  it('energy per hour, average heat, steady and peak temperatures', () => {
    const z = frequency(60 / 3600);
    close(energyPerHour(z, energy(30_000)), 1.8e6, 1e-12);
    close(averageHeat(z, energy(30_000)), 500, 1e-12);
    close(
      steadyTemperature({
        ambient: celsius(20),
        averageHeat: power(500),
        coefficient: heatTransferCoefficient(25),
        area: area(0.5),
      }),
      333.15,
      1e-12,
    );
    const tau = coolingTimeConstant(
      mass(100),
      specificHeat(500),
      heatTransferCoefficient(25),
      area(0.5),
    );
    close(tau, 4000, 1e-12);
    const peak = peakCycleTemperature(celsius(20), temperatureDifference(0.6), z, time(tau));
    // Peak exceeds the mean steady temperature by about ΔT/2 when stops are frequent.
    close(peak - 273.15, 20 + 0.6 / (1 - Math.exp(-60 / 4000)), 1e-12);
  });
  it('temperature history approaches the periodic peak after many time constants', () => {
    const pts = temperatureHistory(293.15, 1, 1 / 60, 600, 36_000, 1000);
    const last = Math.max(...pts.slice(-4).map((p) => p.y));
    close(last, 293.15 + 1 / (1 - Math.exp(-60 / 600)), 1e-6);
  });
});
