/**
 * Properties of liquid water from 0 to 300 °C: at 1 atm below 100 °C, on the liquid–vapour saturation curve
 * from 100 °C (the pressure a closed boiler holds; liquid water cannot exist at 1 atm above its boiling point).
 *
 *   pressure      below 100 °C 0.101325 MPa; from 100 °C the saturation pressure of IAPWS-IF97 region 4
 *                 (IAPWS R7-97(2012), eq. 30; Wagner et al., J. Eng. Gas Turbines Power 122, 150 (2000))
 *   density       below 100 °C Kell, J. Chem. Eng. Data 20, 97 (1975) at 1 atm; from 100 °C the saturated-liquid
 *                 density of Wagner & Pruss, J. Phys. Chem. Ref. Data 22, 783 (1993), eq. 2.3 (the auxiliary
 *                 equation of the IAPWS supplementary release on saturation properties)
 *   permittivity  below 100 °C Malmberg & Maryott, J. Res. Natl. Bur. Stand. 56, 1 (1956); from 100 °C Bradley & Pitzer, J. Phys. Chem. 83, 1599
 *                 (1979), eq. 5 and table I, at the saturation pressure
 *   pKw           IAPWS R11-07 (Bandura & Lvov, J. Phys. Chem. Ref. Data 35, 15 (2006)) at that density
 *
 * The coefficients are the published ones (typed from memory); tests/reference/water-properties.test.ts checks
 * every function against values computed with the full IAPWS formulations (tests/fixtures/iapws-water.json).
 */
import { kelvin } from "./constants";

const { sqrt, exp, log, log10, cbrt } = Math;

/** Temperature from which water is taken on the saturation curve, °C (the normal boiling point, rounded). */
export const SATURATION_FROM_CELSIUS = 100;
/** One standard atmosphere, MPa. */
export const ONE_ATMOSPHERE_MPA = 0.101325;

/** Relative permittivity of liquid water at t °C and 1 atm (Malmberg & Maryott 1956, 0–100 °C). */
export function dielectricAtOneAtmosphere(celsius: number): number {
  const t = celsius;
  return 87.74 + t * (-0.40008 + t * (9.398e-4 + t * -1.41e-6));
}

/** Density of liquid water at 1 atm, g/cm³ (Kell 1975, 0–150 °C). */
export function densityAtOneAtmosphere(celsius: number): number {
  const t = celsius;
  const numerator =
    999.83952 + t * (16.945176 + t * (-7.9870401e-3 + t * (-46.170461e-6 + t * (105.56302e-9 + t * -280.54253e-12))));
  return numerator / (1 + 16.87985e-3 * t) / 1000;
}

/** IAPWS-IF97 region 4 coefficients n1…n10 (R7-97(2012), table 34). */
const N = [
  0.11670521452767e4, -0.72421316598378e6, -0.17073846940092e2, 0.1202082470247e5, -0.32325550322333e7,
  0.1491510861353e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
];

/** Saturation pressure of water at t °C, MPa (IAPWS-IF97 eq. 30, 273.15–647.096 K). */
export function saturationPressure(celsius: number): number {
  const T = kelvin(celsius);
  const theta = T + N[8] / (T - N[9]);
  const A = theta * theta + N[0] * theta + N[1];
  const B = N[2] * theta * theta + N[3] * theta + N[4];
  const C = N[5] * theta * theta + N[6] * theta + N[7];
  return ((2 * C) / (-B + sqrt(B * B - 4 * A * C))) ** 4;
}

/** Pressure the model takes water at, MPa: 1 atm below 100 °C, the saturation pressure from 100 °C. */
export function waterPressure(celsius: number): number {
  return celsius < SATURATION_FROM_CELSIUS ? ONE_ATMOSPHERE_MPA : saturationPressure(celsius);
}

/** Critical temperature (K) and density (kg/m³) of water (IAPWS R2-83). */
const CRITICAL_T = 647.096;
const CRITICAL_RHO = 322;
/** Wagner & Pruss (1993) saturated-liquid density: exponents (in thirds) and coefficients b1…b6. */
const LIQUID_EXPONENTS = [1, 2, 5, 16, 43, 110];
const LIQUID_B = [1.99274064, 1.09965342, -0.510839303, -1.75493479, -45.5170352, -6.7469445e5];

/** Density of saturated liquid water at t °C, g/cm³ (Wagner & Pruss 1993, eq. 2.3). */
export function saturatedLiquidDensity(celsius: number): number {
  const tau = 1 - kelvin(celsius) / CRITICAL_T;
  const third = cbrt(tau);
  let ratio = 1;
  for (let i = 0; i < LIQUID_B.length; i++) ratio += LIQUID_B[i] * third ** LIQUID_EXPONENTS[i];
  return (ratio * CRITICAL_RHO) / 1000;
}

/** Density of liquid water as the model takes it (1 atm below 100 °C, saturated liquid from 100 °C), g/cm³. */
export function liquidDensity(celsius: number): number {
  return celsius < SATURATION_FROM_CELSIUS ? densityAtOneAtmosphere(celsius) : saturatedLiquidDensity(celsius);
}

/** Bradley & Pitzer (1979) coefficients U1…U9 (P in bar, T in K). */
const U = [3.4279e2, -5.0866e-3, 9.469e-7, -2.0525, 3.1159e3, -1.8289e2, -8.0325e3, 4.2142e6, 2.1417];

/** Relative permittivity of water at T (K) and P (bar), Bradley & Pitzer (1979) eq. 5. */
export function bradleyPitzerDielectric(kelvinT: number, bar: number): number {
  const e1000 = U[0] * exp(U[1] * kelvinT + U[2] * kelvinT * kelvinT);
  const C = U[3] + U[4] / (U[5] + kelvinT);
  const B = U[6] + U[7] / kelvinT + U[8] * kelvinT;
  return e1000 + C * log((B + bar) / (B + 1000));
}

/** Relative permittivity of liquid water as the model takes it (Malmberg & Maryott below 100 °C, Bradley & Pitzer on the saturation curve from 100 °C). */
export function liquidDielectric(celsius: number): number {
  if (celsius < SATURATION_FROM_CELSIUS) return dielectricAtOneAtmosphere(celsius);
  return bradleyPitzerDielectric(kelvin(celsius), saturationPressure(celsius) * 10);
}

/** IAPWS R11-07 constants (Bandura & Lvov 2006, table 1). */
const KW = {
  n: 6,
  alpha0: -0.864671,
  alpha1: 8659.19,
  alpha2: -22786.2,
  beta0: 0.642044,
  beta1: -56.8534,
  beta2: -0.375754,
  molarMass: 18.015268,
};

/** pKw of water at T (K) and density ρ (g/cm³), molal scale (IAPWS R11-07, eq. 1–3). */
export function banduraLvovPKw(kelvinT: number, density: number): number {
  const { n, alpha0, alpha1, alpha2, beta0, beta1, beta2, molarMass } = KW;
  const Z = density * exp(alpha0 + alpha1 / kelvinT + (alpha2 / (kelvinT * kelvinT)) * density ** (2 / 3));
  const pKwGas = 0.61415 + 48251.33 / kelvinT - 67707.93 / kelvinT ** 2 + 10102100 / kelvinT ** 3;
  return (
    -2 * n * (log10(1 + Z) - (Z / (Z + 1)) * density * (beta0 + beta1 / kelvinT + beta2 * density)) +
    pKwGas +
    2 * log10(molarMass / 1000)
  );
}

/** pKw of liquid water at t °C as the model takes it (R11-07 at 1 atm below 100 °C, on the saturation curve from 100 °C). */
export function waterPKw(celsius: number): number {
  return banduraLvovPKw(kelvin(celsius), liquidDensity(celsius));
}
