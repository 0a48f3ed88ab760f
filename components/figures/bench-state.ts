// The Bench keeps each tool's state in the URL query, so a setting can be shared and reloaded.
// Query values are parsed one key at a time: a bad value is dropped (and reported) and the
// figure's default stands in for it. Values in the URL are always SI (m, °C).
// This runs in the browser, so the parsers are a few small functions rather than zod: zod
// (even its "mini" build, which this bundler does not tree-shake) added 18–32 KiB gzipped to
// every Bench tool page (measured with npm run measure:first-load). The server never reads
// these values: they only choose a figure's starting state.
import { PICKUP_PATTERN_IDS, PICKUP_PATTERNS, type PickupPatternId } from "@/lib/acoustics/patterns";
import { ALIGNMENT_IDS } from "@/lib/acoustics/alignment";
import { PHANTOM_SUPPLIES, type PhantomSupplyId } from "@/lib/acoustics/phantom";
import type { FigureName } from "./figure-names";
import { GAIN_STRUCTURE_LIMITS, type GainStructureState } from "./gain-structure-state";
import {
  LIMITS,
  patternForCoefficient,
  supplyVoltageRange,
  type DirectBoxState,
  type DistanceLevelState,
  type FeedbackMarginState,
  type NoiseDoseState,
  type PhantomPowerState,
  type PickupPatternState,
  type ProximityState,
  type TwoMicsState,
} from "./figure-state";

export interface BenchStates {
  "pickup-pattern": PickupPatternState;
  proximity: ProximityState;
  "two-mics": TwoMicsState;
  "distance-level": DistanceLevelState;
  "direct-box": DirectBoxState;
  "phantom-power": PhantomPowerState;
  "feedback-margin": FeedbackMarginState;
  "noise-dose": NoiseDoseState;
  "gain-structure": GainStructureState;
}

export type QueryInput = URLSearchParams | Readonly<Record<string, string | readonly string[] | undefined>>;

export interface ParsedBenchQuery<Name extends FigureName> {
  state: Partial<BenchStates[Name]>;
  /** Query keys whose values were refused (unknown keys are ignored, not listed). */
  rejectedKeys: string[];
}

/** Plain decimal notation only: no hex, no "Infinity", no empty string. */
const DECIMAL = /^[-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?$/i;

/** Reads one query value: the parsed value, or `undefined` when it is refused. */
type QueryParser<T = unknown> = (raw: string) => T | undefined;

/** A finite number within bounds, from a query string in decimal notation. */
function numberIn(bounds: { min: number; max: number }, { integer = false } = {}): QueryParser<number> {
  return (raw) => {
    const text = raw.trim();
    if (!DECIMAL.test(text)) return undefined;
    const value = Number(text);
    if (!Number.isFinite(value) || (integer && !Number.isInteger(value))) return undefined;
    return value >= bounds.min && value <= bounds.max ? value : undefined;
  };
}

function oneOf<const T extends string>(values: readonly T[]): QueryParser<T> {
  return (raw) => (values as readonly string[]).includes(raw) ? (raw as T) : undefined;
}

const patternId = oneOf(PICKUP_PATTERN_IDS as readonly PickupPatternId[]);
const supplyId = oneOf(Object.keys(PHANTOM_SUPPLIES) as PhantomSupplyId[]);
const flag: QueryParser<boolean> = (raw) => (["1", "true"].includes(raw) ? true : ["0", "false"].includes(raw) ? false : undefined);

/** "level:hours,level:hours,…" → segments; one bad pair refuses the whole list. */
const segmentList: QueryParser<{ levelDba: number; hours: number }[]> = (raw) => {
  const text = raw.trim();
  if (text.length === 0) return undefined;
  const level = numberIn(LIMITS.noiseLevelDba);
  const hoursOf = numberIn(LIMITS.noiseHours);
  const segments: { levelDba: number; hours: number }[] = [];
  for (const pair of text.split(",")) {
    const parts = pair.split(":");
    if (parts.length !== 2 || parts[0] === "" || parts[1] === "") return undefined;
    const levelDba = level(parts[0]);
    const hours = hoursOf(parts[1]);
    if (levelDba === undefined || hours === undefined) return undefined;
    segments.push({ levelDba, hours });
  }
  const { min, max } = LIMITS.noiseSegments;
  return segments.length >= min && segments.length <= max ? segments : undefined;
};

interface ToolCodec<State> {
  /** URL key → parser of its value. */
  schema: Record<string, QueryParser>;
  /** Valid URL values → state; may refuse more keys on cross-field rules. */
  toState: (values: Record<string, unknown>, reject: (key: string) => void) => Partial<State>;
  toQuery: (state: State) => Record<string, string>;
}

/** Shortest text that keeps six significant figures (enough for feet converted to metres). */
function numberText(value: number): string {
  return String(Number(value.toPrecision(6)));
}

function pick<State>(values: Record<string, unknown>, mapping: Record<string, keyof State>): Partial<State> {
  const state: Partial<State> = {};
  for (const [key, stateKey] of Object.entries(mapping)) {
    if (values[key] !== undefined) state[stateKey] = values[key] as State[keyof State];
  }
  return state;
}

function numbersToQuery<State>(state: State, mapping: Record<string, keyof State>): Record<string, string> {
  return Object.fromEntries(Object.entries(mapping).map(([key, stateKey]) => [key, numberText(state[stateKey] as number)]));
}

const PICKUP_ANGLES = { voice: "voiceDeg", wedge: "wedgeDeg", cymbal: "cymbalDeg" } as const;
const pickupCodec: ToolCodec<PickupPatternState> = {
  schema: {
    pattern: oneOf([...(PICKUP_PATTERN_IDS as readonly PickupPatternId[]), "custom"]),
    a: numberIn(LIMITS.patternA),
    voice: numberIn(LIMITS.angleDeg),
    wedge: numberIn(LIMITS.angleDeg),
    cymbal: numberIn(LIMITS.angleDeg),
  },
  toState: (values) => {
    const state = pick<PickupPatternState>(values, PICKUP_ANGLES);
    const pattern = values.pattern as PickupPatternState["pattern"] | undefined;
    const a = values.a as number | undefined;
    if (pattern && pattern !== "custom") Object.assign(state, { pattern, a: PICKUP_PATTERNS[pattern].a });
    else if (a !== undefined) Object.assign(state, { pattern: pattern ?? patternForCoefficient(a), a });
    return state;
  },
  toQuery: (state) => ({
    pattern: state.pattern,
    ...(state.pattern === "custom" ? { a: numberText(state.a) } : {}),
    ...numbersToQuery(state, PICKUP_ANGLES),
  }),
};

const PROXIMITY_NUMBERS = { distance: "distanceM", temp: "temperatureC" } as const;
const proximityCodec: ToolCodec<ProximityState> = {
  schema: { pattern: patternId, distance: numberIn(LIMITS.proximityDistanceM), temp: numberIn(LIMITS.temperatureC) },
  toState: (values) => pick<ProximityState>(values, { pattern: "pattern", ...PROXIMITY_NUMBERS }),
  toQuery: (state) => ({ pattern: state.pattern, ...numbersToQuery(state, PROXIMITY_NUMBERS) }),
};

const TWO_MICS_NUMBERS = { near: "nearM", far: "farM", temp: "temperatureC" } as const;
const twoMicsCodec: ToolCodec<TwoMicsState> = {
  schema: { near: numberIn(LIMITS.micDistanceM), far: numberIn(LIMITS.micDistanceM), temp: numberIn(LIMITS.temperatureC) },
  toState: (values) => pick<TwoMicsState>(values, TWO_MICS_NUMBERS),
  toQuery: (state) => numbersToQuery(state, TWO_MICS_NUMBERS),
};

const DISTANCE_LEVEL_NUMBERS = { ref: "referenceLevelDb", refm: "referenceM", at: "distanceM", change: "changeDb" } as const;
const distanceLevelCodec: ToolCodec<DistanceLevelState> = {
  schema: {
    ref: numberIn(LIMITS.referenceLevelDb),
    refm: numberIn(LIMITS.levelDistanceM),
    at: numberIn(LIMITS.levelDistanceM),
    change: numberIn(LIMITS.changeDb),
  },
  toState: (values) => pick<DistanceLevelState>(values, DISTANCE_LEVEL_NUMBERS),
  toQuery: (state) => numbersToQuery(state, DISTANCE_LEVEL_NUMBERS),
};

const DIRECT_BOX_NUMBERS = { source: "sourceLevelDbu", zs: "sourceImpedanceOhms", ratio: "turnsRatio", zin: "preampInputOhms" } as const;
const directBoxCodec: ToolCodec<DirectBoxState> = {
  schema: {
    source: numberIn(LIMITS.sourceLevelDbu),
    zs: numberIn(LIMITS.sourceImpedanceOhms),
    ratio: numberIn(LIMITS.turnsRatio),
    zin: numberIn(LIMITS.preampInputOhms),
    lift: flag,
  },
  toState: (values) => pick<DirectBoxState>(values, { ...DIRECT_BOX_NUMBERS, lift: "groundLift" }),
  toQuery: (state) => ({ ...numbersToQuery(state, DIRECT_BOX_NUMBERS), lift: state.groundLift ? "1" : "0" }),
};

const phantomCodec: ToolCodec<PhantomPowerState> = {
  schema: { supply: supplyId, volts: numberIn(LIMITS.supplyV), ma: numberIn(LIMITS.currentMa) },
  toState: (values, reject) => {
    const state = pick<PhantomPowerState>(values, { supply: "supply", volts: "supplyV", ma: "currentMa" });
    // The voltage must suit the supply it is given with (or the default P48).
    if (state.supplyV !== undefined) {
      const range = supplyVoltageRange(state.supply ?? "P48");
      if (state.supplyV < range.min || state.supplyV > range.max) {
        delete state.supplyV;
        reject("volts");
      }
    }
    if (state.supply !== undefined && state.supplyV === undefined) state.supplyV = PHANTOM_SUPPLIES[state.supply].nominalV;
    return state;
  },
  toQuery: (state) => ({ supply: state.supply, volts: numberText(state.supplyV), ma: numberText(state.currentMa) }),
};

const FEEDBACK_NUMBERS = { ds: "dsM", d0: "d0M", d1: "d1M", d2: "d2M", ead: "eadM", nom: "openMics", dc: "criticalDistanceM" } as const;
const feedbackCodec: ToolCodec<FeedbackMarginState> = {
  schema: {
    ds: numberIn({ min: 0.02, max: 5 }),
    d0: numberIn(LIMITS.feedbackDistanceM),
    d1: numberIn(LIMITS.feedbackDistanceM),
    d2: numberIn(LIMITS.feedbackDistanceM),
    ead: numberIn(LIMITS.feedbackDistanceM),
    nom: numberIn(LIMITS.openMics, { integer: true }),
    room: oneOf(["indoor", "outdoor"]),
    dc: numberIn(LIMITS.criticalDistanceM),
  },
  toState: (values) => pick<FeedbackMarginState>(values, { ...FEEDBACK_NUMBERS, room: "room" }),
  toQuery: (state) => ({ ...numbersToQuery(state, FEEDBACK_NUMBERS), room: state.room }),
};

const noiseCodec: ToolCodec<NoiseDoseState> = {
  schema: { s: segmentList, next: numberIn({ min: LIMITS.noiseLevelDba.min, max: 120 }) },
  toState: (values) => pick<NoiseDoseState>(values, { s: "segments", next: "nextLevelDba" }),
  toQuery: (state) => ({
    s: state.segments.map((segment) => `${numberText(segment.levelDba)}:${numberText(segment.hours)}`).join(","),
    next: numberText(state.nextLevelDba),
  }),
};

const GAIN_NUMBERS = { spl: "splDb", sens: "mvPerPa", gain: "preampGainDb", ein: "einDbu", fader: "channelFaderDb", bus: "busFaderDb" } as const;
const gainStructureCodec: ToolCodec<GainStructureState> = {
  schema: {
    align: oneOf(ALIGNMENT_IDS),
    spl: numberIn(GAIN_STRUCTURE_LIMITS.splDb),
    sens: numberIn(GAIN_STRUCTURE_LIMITS.mvPerPa),
    pad: flag,
    gain: numberIn(GAIN_STRUCTURE_LIMITS.preampGainDb),
    ein: numberIn(GAIN_STRUCTURE_LIMITS.einDbu),
    fader: numberIn(GAIN_STRUCTURE_LIMITS.faderDb),
    bus: numberIn(GAIN_STRUCTURE_LIMITS.faderDb),
  },
  toState: (values) => pick<GainStructureState>(values, { ...GAIN_NUMBERS, align: "alignment", pad: "pad" }),
  toQuery: (state) => ({ align: state.alignment, ...numbersToQuery(state, GAIN_NUMBERS), pad: state.pad ? "1" : "0" }),
};

const CODECS: { [Name in FigureName]: ToolCodec<BenchStates[Name]> } = {
  "pickup-pattern": pickupCodec,
  proximity: proximityCodec,
  "two-mics": twoMicsCodec,
  "distance-level": distanceLevelCodec,
  "direct-box": directBoxCodec,
  "phantom-power": phantomCodec,
  "feedback-margin": feedbackCodec,
  "noise-dose": noiseCodec,
  "gain-structure": gainStructureCodec,
};

function readQuery(params: QueryInput, key: string): string | undefined {
  if (params instanceof URLSearchParams) return params.get(key) ?? undefined;
  const value = params[key];
  return typeof value === "string" ? value : value?.[0];
}

/** The URL keys a tool reads. */
export function benchQueryKeys(tool: FigureName): string[] {
  return Object.keys(CODECS[tool].schema);
}

/** Query → partial state; each refused key is listed in `rejectedKeys` and left to the default. */
export function parseBenchQuery<Name extends FigureName>(tool: Name, params: QueryInput): ParsedBenchQuery<Name> {
  const codec = CODECS[tool] as ToolCodec<BenchStates[Name]>;
  const rejectedKeys: string[] = [];
  const values: Record<string, unknown> = {};
  for (const [key, parse] of Object.entries(codec.schema)) {
    const raw = readQuery(params, key);
    if (raw === undefined) continue;
    const value = parse(raw);
    if (value !== undefined) values[key] = value;
    else rejectedKeys.push(key);
  }
  const state = codec.toState(values, (key) => rejectedKeys.push(key));
  return { state, rejectedKeys };
}

/** State → query string (no leading "?"), every key written so a shared link is complete. */
export function benchQueryString<Name extends FigureName>(tool: Name, state: BenchStates[Name]): string {
  const codec = CODECS[tool] as ToolCodec<BenchStates[Name]>;
  return new URLSearchParams(codec.toQuery(state)).toString();
}
