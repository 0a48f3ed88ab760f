/**
 * Thermal (Johnson–Nyquist) noise of a resistance, and a preamp's noise against it.
 *
 * The open-circuit rms noise voltage of a resistance R at absolute temperature T, measured
 * over a bandwidth B, is v = √(4·k·T·R·B) (J. B. Johnson, "Thermal agitation of electricity
 * in conductors", and H. Nyquist, "Thermal agitation of electric charge in conductors",
 * Physical Review 32, 1928). k is the Boltzmann constant, exactly 1.380649 × 10⁻²³ J/K since
 * the 2019 redefinition of the SI (BIPM, The International System of Units, 9th ed., 2019).
 *
 * A microphone's source resistance makes this noise before any preamp does, so it is the floor
 * that no preamp's equivalent input noise (EIN) can go below when measured with that source.
 * Preamp EIN is usually quoted with a 150 Ω source over a 20 kHz bandwidth (common practice).
 */
import { voltsToDbu } from "./levels";
import { requireFinite, requirePositive } from "./validate";

/** Boltzmann constant, J/K, exact in the SI since 2019 (BIPM SI Brochure, 9th ed.). */
export const BOLTZMANN_J_PER_K = 1.380649e-23;

/** The standard reference temperature of noise-figure definitions, 290 K (IEEE; about 17 °C). */
export const STANDARD_NOISE_TEMPERATURE_K = 290;

/** The source resistance preamp EIN is usually quoted with, Ω (common practice). */
export const EIN_SOURCE_RESISTANCE_OHMS = 150;

/** The bandwidth preamp EIN is usually quoted over, Hz (20 Hz–20 kHz, taken as 20 kHz; common practice). */
export const AUDIO_BANDWIDTH_HZ = 20_000;

interface ThermalNoiseArgs {
  resistanceOhms: number;
  bandwidthHz: number;
  temperatureK: number;
}

/**
 * Open-circuit rms noise voltage of a resistance: v = √(4·k·T·R·B) volts (Johnson 1928;
 * Nyquist 1928). 1 kΩ over 10 kHz at 290 K → 0.400 µV (Wikipedia "Johnson–Nyquist noise":
 * "400 nV" at room temperature); 150 Ω over 20 kHz at 290 K → 0.219 µV.
 */
export function thermalNoiseVolts({ resistanceOhms, bandwidthHz, temperatureK }: ThermalNoiseArgs): number {
  requirePositive("resistanceOhms", resistanceOhms);
  requirePositive("bandwidthHz", bandwidthHz);
  requirePositive("temperatureK", temperatureK);
  return Math.sqrt(4 * BOLTZMANN_J_PER_K * temperatureK * resistanceOhms * bandwidthHz);
}

/**
 * The same noise as a level in dBu (re √0.6 V, ITU-R V.574): 20·log10(√(4kTRB)/0.7746 V).
 * 150 Ω over 20 kHz: −131.0 dBu at 290 K, −130.8 dBu at 300 K (the trade's "−131 dBu").
 */
export function thermalNoiseDbu(args: ThermalNoiseArgs): number {
  return voltsToDbu(thermalNoiseVolts(args));
}

/** Noise voltage density √(4·k·T·R) in nV/√Hz: 1 kΩ at 300 K → 4.07 nV/√Hz. */
export function thermalNoiseDensityNvPerRootHz({ resistanceOhms, temperatureK }: { resistanceOhms: number; temperatureK: number }): number {
  return 1e9 * thermalNoiseVolts({ resistanceOhms, temperatureK, bandwidthHz: 1 });
}

/**
 * A preamp's noise figure from its EIN: NF = EIN − (thermal noise of the source resistance),
 * in dB, both over the same bandwidth and measured with that source resistance (the noise
 * figure is the ratio of the total input-referred noise to the source's own, IEEE noise-figure
 * definition at T₀ = 290 K). EIN −129 dBu with 150 Ω over 20 kHz → 2.0 dB at 290 K.
 * An EIN below the source's own noise cannot have been measured with that source (a shorted
 * input gives such figures), so it is refused.
 */
export function noiseFigureDb({
  einDbu,
  resistanceOhms = EIN_SOURCE_RESISTANCE_OHMS,
  bandwidthHz = AUDIO_BANDWIDTH_HZ,
  temperatureK = STANDARD_NOISE_TEMPERATURE_K,
}: {
  einDbu: number;
  resistanceOhms?: number;
  bandwidthHz?: number;
  temperatureK?: number;
}): number {
  requireFinite("einDbu", einDbu);
  const floorDbu = thermalNoiseDbu({ resistanceOhms, bandwidthHz, temperatureK });
  // Allow rounding in a quoted EIN (to 0.05 dB) before calling it impossible.
  if (einDbu < floorDbu - 0.05) {
    throw new RangeError(`einDbu ${einDbu} is below the thermal noise of the source (${floorDbu.toFixed(2)} dBu): it cannot have been measured with ${resistanceOhms} Ω`);
  }
  return Math.max(0, einDbu - floorDbu);
}

/**
 * The preamp's own noise, referred to its input: its EIN (measured with the source resistance,
 * so it contains the source's thermal noise) with the source's share taken out by power,
 * 10·log10(10^(EIN/10) − 10^(N_source/10)) dBu. This is what stays when a pad in front of the
 * preamp lowers the signal and the source's noise together. An EIN at the floor leaves
 * nothing (−Infinity); below it is refused, as in noiseFigureDb. EIN 3.01 dB above the
 * floor → a preamp exactly as noisy as the source.
 */
export function preampOwnNoiseDbu({
  einDbu,
  resistanceOhms = EIN_SOURCE_RESISTANCE_OHMS,
  bandwidthHz = AUDIO_BANDWIDTH_HZ,
  temperatureK = STANDARD_NOISE_TEMPERATURE_K,
}: {
  einDbu: number;
  resistanceOhms?: number;
  bandwidthHz?: number;
  temperatureK?: number;
}): number {
  const figureDb = noiseFigureDb({ einDbu, resistanceOhms, bandwidthHz, temperatureK });
  if (figureDb === 0) return -Infinity;
  const floorDbu = thermalNoiseDbu({ resistanceOhms, bandwidthHz, temperatureK });
  return floorDbu + 10 * Math.log10(10 ** (figureDb / 10) - 1);
}
