/**
 * Electrical and acoustic levels: dBu, dBV, SPL and microphone sensitivity.
 *
 * References (ITU-R V.574-5, §6.5 absolute voltage level and §6.8 SPL):
 * - 0 dBu = √(1 mW × 600 Ω) = √0.6 V ≈ 0.7746 V rms (ITU-R BS.645-2 uses 0.775 V).
 * - 0 dBV = 1 V rms.
 * - 0 dB SPL = 20 µPa in air (ISO 1683:2015; ANSI/ASA S1.1).
 * Level values are rms.
 */
import { requireFinite, requireNonNegative, requirePositive } from "./validate";

/** 0 dBu reference voltage, √0.6 V rms (√(1 mW·600 Ω)). */
export const DBU_REFERENCE_VOLTS = Math.sqrt(0.6);

/** 0 dBV reference voltage, 1 V rms. */
export const DBV_REFERENCE_VOLTS = 1;

/** Reference sound pressure in air, 20 µPa (ISO 1683:2015). */
export const REFERENCE_PRESSURE_PA = 20e-6;

/** Level at which the trade's 1 Pa calibrator tone is quoted, dB SPL (94 dB SPL = 1.00237 Pa). */
export const CALIBRATOR_LEVEL_DB_SPL = 94;

/** Amplitude ratio → dB; 0 → −Infinity. */
function ratioToDb(ratio: number): number {
  return ratio === 0 ? -Infinity : 20 * Math.log10(ratio);
}

/** dBu → volts rms: V = √0.6·10^(L/20) (ITU-R V.574; 0 dBu = 0.7746 V). */
export function dbuToVolts(levelDbu: number): number {
  requireFinite("levelDbu", levelDbu);
  return DBU_REFERENCE_VOLTS * 10 ** (levelDbu / 20);
}

/** Volts rms → dBu: L = 20·log10(V/√0.6) (ITU-R V.574). 0 V → −Infinity. */
export function voltsToDbu(volts: number): number {
  requireNonNegative("volts (rms)", volts);
  return ratioToDb(volts / DBU_REFERENCE_VOLTS);
}

/** dBV → volts rms: V = 10^(L/20) (ITU-R V.574; 0 dBV = 1 V). */
export function dbvToVolts(levelDbv: number): number {
  requireFinite("levelDbv", levelDbv);
  return DBV_REFERENCE_VOLTS * 10 ** (levelDbv / 20);
}

/** Volts rms → dBV: L = 20·log10(V/1 V) (ITU-R V.574). 0 V → −Infinity. */
export function voltsToDbv(volts: number): number {
  requireNonNegative("volts (rms)", volts);
  return ratioToDb(volts / DBV_REFERENCE_VOLTS);
}

/** dBV → dBu: L_dBu = L_dBV + 20·log10(1 V/√0.6 V) = L_dBV + 2.2185 dB (references per ITU-R V.574). */
export function dbvToDbu(levelDbv: number): number {
  return voltsToDbu(dbvToVolts(levelDbv));
}

/** dBu → dBV: L_dBV = L_dBu − 2.2185 dB (references per ITU-R V.574). */
export function dbuToDbv(levelDbu: number): number {
  return voltsToDbv(dbuToVolts(levelDbu));
}

/** Sound pressure (Pa rms) → SPL: L_p = 20·log10(p/20 µPa) dB (ISO 1683:2015). 1 Pa → 93.979 dB. */
export function splDbFromPa(pressurePa: number): number {
  requireNonNegative("pressurePa (rms)", pressurePa);
  return ratioToDb(pressurePa / REFERENCE_PRESSURE_PA);
}

/** SPL → sound pressure, p = 20 µPa·10^(L/20) Pa rms (ISO 1683:2015). 94 dB → 1.00237 Pa. */
export function paFromSplDb(splDb: number): number {
  requireFinite("splDb", splDb);
  return REFERENCE_PRESSURE_PA * 10 ** (splDb / 20);
}

/**
 * Microphone sensitivity in dB re 1 V/Pa: S = 20·log10((mV/Pa)/1000)
 * (sengpielaudio, "Microphone sensitivity and conversion"; IEC 60268-4 gives
 * sensitivity in V/Pa). 50 mV/Pa → −26.02 dBV.
 */
export function micSensitivityDbv({ mvPerPa }: { mvPerPa: number }): number {
  requirePositive("mvPerPa", mvPerPa);
  return 20 * Math.log10(mvPerPa / 1000);
}

/** Inverse of `micSensitivityDbv`: mV/Pa = 1000·10^(S/20). */
export function micSensitivityMvPerPa({ sensitivityDbv }: { sensitivityDbv: number }): number {
  requireFinite("sensitivityDbv", sensitivityDbv);
  return 1000 * 10 ** (sensitivityDbv / 20);
}

/**
 * Sensitivity in dB re 1 V/µbar from dB re 1 V/Pa: subtract 20 dB,
 * because 1 Pa = 10 µbar (sengpielaudio).
 */
export function dbvPerPaToDbvPerMicrobar(sensitivityDbvPerPa: number): number {
  requireFinite("sensitivityDbvPerPa", sensitivityDbvPerPa);
  return sensitivityDbvPerPa - 20;
}

/**
 * Open-circuit output voltage (rms) of a microphone at a given SPL:
 * V = S·p, with S = mV/Pa / 1000 and p = 20 µPa·10^(L/20) (ISO 1683).
 *
 * With `assume94DbIs1Pa: true` it uses the trade's shortcut
 * V = S·10^((L − 94)/20), i.e. treats 94 dB SPL as exactly 1 Pa. The shortcut
 * reads 0.02 dB low (94 dB SPL is 1.00237 Pa). 10 mV/Pa at 114 dB SPL →
 * 0.1002 V exact, 0.1000 V with the shortcut.
 */
export function micOutputVolts({
  mvPerPa,
  splDb,
  assume94DbIs1Pa = false,
}: {
  mvPerPa: number;
  splDb: number;
  assume94DbIs1Pa?: boolean;
}): number {
  requirePositive("mvPerPa", mvPerPa);
  requireFinite("splDb", splDb);
  const pressurePa = assume94DbIs1Pa ? 10 ** ((splDb - CALIBRATOR_LEVEL_DB_SPL) / 20) : paFromSplDb(splDb);
  return (mvPerPa / 1000) * pressurePa;
}
