import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  itemFlags,
  itemStatistics,
  listwiseComplete,
  pearsonR,
  pointBiserialR,
  upperLowerGroupSize,
} from "@/lib/assessment";

const close = (actual: number | null, expected: number, tolerance: number) => {
  expect(actual).not.toBeNull();
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(tolerance);
};

// pingouin `cronbach_wide_missing` dataset (pingouin src/pingouin/datasets/cronbach_wide_missing.csv,
// origin real-statistics.com); null = missing.
const _ = null;
const CRONBACH_WIDE_MISSING: (number | null)[][] = [
  [1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1],
  [1, 1, 1, 1, 1, 1, 1, 1, 0, 1, 0],
  [_, 0, 1, 1, _, 1, 1, 1, 1, 0, 0],
  [1, 1, 1, 0, 1, 1, 0, 1, 1, 0, 0],
  [1, 1, 1, 1, 1, 0, 0, 0, 1, 0, 0],
  [0, 1, _, 0, 1, 1, 1, 1, 0, 0, 0],
  [1, 1, 1, 1, 0, 0, 1, 0, 0, 0, 0],
  [1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0],
  [0, 1, 0, 1, 1, 0, 0, 0, 0, 1, 0],
  [1, 0, 0, 1, 0, 1, 0, 0, _, 0, 0],
  [1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0],
  [1, 0, 0, 1, 0, 0, 0, 0, 0, 0, 0],
];

// Wuensch, East Carolina University, "KR20.txt": 10 students (A–J) × 10 items.
const WUENSCH = [
  "1111110110",
  "1011011101",
  "1111011001",
  "0010001000",
  "0000010010",
  "1110111111",
  "1101110111",
  "1111111101",
  "0101111101",
  "1101101110",
].map((row) => Array.from(row, Number));

describe("point-biserial r", () => {
  // scipy.stats.pointbiserialr docstring: a = [0,0,0,1,1,1,1], b = [0..6] → r = 0.8660254037844386 (= √3/2)
  const a = [0, 0, 0, 1, 1, 1, 1];
  const b = [0, 1, 2, 3, 4, 5, 6];

  it("matches the scipy docstring example", () => {
    close(pointBiserialR(a, b), 0.8660254037844386, 1e-12);
    close(pearsonR(a, b), Math.sqrt(3) / 2, 1e-12); // hand check: M₁ = 4.5, M₀ = 1, s_n = 2, √(pq) = √12/7
  });

  it("equals r_pb of an item with the total inside itemStatistics", () => {
    // Item 1 is `a`; five more 0/1 items make the rest scores b − a = [0,1,2,2,3,4,5], so total = b.
    // Same scipy docstring example, embedded in a response matrix.
    const rest = [0, 1, 2, 2, 3, 4, 5];
    const responses = a.map((item, i) => [item, ...Array.from({ length: 5 }, (_, j) => (j < rest[i] ? 1 : 0))]);
    expect(responses.map((row) => row.reduce((s, x) => s + x, 0))).toEqual(b);
    close(itemStatistics({ responses }).items[0].rpb, 0.8660254037844386, 1e-12);
  });

  it("is null, not NaN, for a constant series", () => {
    expect(pearsonR([1, 1, 1], [1, 2, 3])).toBeNull();
    expect(pearsonR([1, 2, 3], [5, 5, 5])).toBeNull();
  });
});

describe("itemStatistics on the 9 complete rows of cronbach_wide_missing", () => {
  const complete = listwiseComplete(CRONBACH_WIDE_MISSING);
  const stats = itemStatistics({ responses: complete });

  it("keeps 9 complete rows (listwise deletion)", () => {
    expect(complete).toHaveLength(9);
    expect(stats.n).toBe(9);
    expect(stats.k).toBe(11);
    expect(stats.binary).toBe(true);
  });

  it("α and KR-20 equal pingouin's listwise α", () => {
    // pingouin cronbach_alpha docstring, listwise (= R psych::alpha use="complete.obs"): 0.8016949152542373
    close(stats.alpha, 0.8016949152542373, 1e-12);
    // KR-20 with population variance equals the listwise α of the pingouin docstring [derived]
    close(stats.kr20, 0.8016949152542373, 1e-12);
  });

  it("total-score moments, Σpq, KR-21 and SEM", () => {
    // [derived from pingouin's published cronbach_wide_missing data]
    close(stats.mean, 5.7778, 5e-5);
    close(stats.variance, 7.28395, 5e-6);
    close(stats.sd, 2.69888, 5e-6);
    close(stats.sumPq, 1.97531, 5e-6);
    close(stats.kr21, 0.68576, 5e-6);
    // Population SD convention: 2.69888·√(1 − 0.80169) = 1.20185 (1.27475 would be the sample SD)
    close(stats.sem, 1.20185, 5e-6);
  });

  it("uses groups of 2 for N = 9 under the 27 % rule", () => {
    // round(0.27·9) = round(2.43) = 2 (Kelley 1939: top and bottom 27 %)
    expect(upperLowerGroupSize(9)).toBe(2);
    expect(stats.groupSize).toBe(2);
  });

  // Item statistics of the 9 complete rows, 4 decimals [derived from pingouin's published data]
  const TABLE_D = [
    { p: 0.8889, rpb: 0.2329, rCorrected: 0.1189, d2: 0.0, d3: 0.333 },
    { p: 0.8889, rpb: 0.4949, rCorrected: 0.3993, d2: 0.5, d3: 0.333 },
    { p: 0.7778, rpb: 0.5501, rCorrected: 0.4286, d2: 0.5, d3: 0.667 },
    { p: 0.7778, rpb: 0.154, rCorrected: 0.0, d2: 0.5, d3: 0.0 },
    { p: 0.6667, rpb: 0.6404, rCorrected: 0.5186, d2: 1.0, d3: 0.667 },
    { p: 0.3333, rpb: 0.8442, rCorrected: 0.7807, d2: 1.0, d3: 1.0 },
    { p: 0.3333, rpb: 0.6696, rCorrected: 0.5545, d2: 1.0, d3: 0.667 },
    { p: 0.3333, rpb: 0.8442, rCorrected: 0.7807, d2: 1.0, d3: 1.0 },
    { p: 0.3333, rpb: 0.5822, rCorrected: 0.4481, d2: 0.5, d3: 0.667 },
    { p: 0.3333, rpb: 0.5822, rCorrected: 0.4481, d2: 1.0, d3: 0.333 },
    { p: 0.1111, rpb: 0.6841, rCorrected: 0.6142, d2: 0.5, d3: 0.333 },
  ];

  it("p, r_pb, corrected r and D (groups of 2) per item", () => {
    TABLE_D.forEach((row, index) => {
      const item = stats.items[index];
      close(item.p, row.p, 5e-5);
      close(item.rpb, row.rpb, 5e-5);
      close(item.rCorrected, row.rCorrected, 5e-5);
      close(item.d, row.d2, 1e-12);
    });
  });

  it("Q4's corrected item–total r is exactly 0", () => {
    // Q4's corrected r is exactly 0, an edge case [derived from pingouin's published data]
    expect(stats.items[3].rCorrected).toBe(0);
  });

  it("D with groups of 3 (no ties at the boundary for these totals)", () => {
    const withThree = itemStatistics({ responses: complete, groupSize: 3 });
    TABLE_D.forEach((row, index) => close(withThree.items[index].d, row.d3, 5e-4));
  });
});

describe("itemStatistics on Wuensch's KR20 example", () => {
  const stats = itemStatistics({ responses: WUENSCH });

  it("p per item, Σpq and the variance of the totals are the printed ones", () => {
    // Wuensch KR20.txt: p = .7 .7 .6 .7 .6 .8 .7 .7 .5 .6, Σpq = 2.18, variance 5.84 (population)
    const printedP = [0.7, 0.7, 0.6, 0.7, 0.6, 0.8, 0.7, 0.7, 0.5, 0.6];
    stats.items.forEach((item, index) => close(item.p, printedP[index], 1e-12));
    close(stats.sumPq, 2.18, 1e-12);
    close(stats.variance, 5.84, 1e-12);
  });

  it("KR-20 = 10/9·(1 − 2.18/5.84) = 0.696347 and equals α on 0/1 items", () => {
    // Wuensch, "KR20.txt" [derived from the printed Σpq and variance]
    close(stats.kr20, 0.696347, 5e-7);
    close(stats.alpha, stats.kr20 as number, 1e-12);
    close(stats.kr21, 0.68417, 5e-6); // [derived]
    close(stats.sem, 1.33167, 5e-6); // [derived], SD_pop 2.41661
    close(stats.sd, 2.41661, 5e-6);
  });

  it("item 1 D = 1.0 with top and bottom groups of 2", () => {
    // Wuensch, "KR20.txt": groups of 2 are totals 9, 9 vs 2, 2 (no tie); item-1 D = 1.0
    expect(itemStatistics({ responses: WUENSCH, groupSize: 2 }).items[0].d).toBe(1);
  });

  it("shares boundary ties fractionally with the default groups of 3", () => {
    // round(0.27·10) = 3. Totals: A 8, B 7, C 7, D 2, E 2, F 9, G 8, H 9, I 7, J 7.
    // Upper: F, H + A and G at weight 1/2; lower: D, E + B, C, I, J at weight 1/4.
    // Expected D values computed by hand from that rule with numpy [derived].
    expect(stats.groupSize).toBe(3);
    const expected = [0.75, 0.75, 1 / 3, 1 / 3, 5 / 6, 5 / 12, 0, 0.75, 0.25, 7 / 12];
    stats.items.forEach((item, index) => close(item.d, expected[index], 1e-12));
  });
});

describe("itemStatistics edge cases", () => {
  it("returns null rather than NaN for zero variance", () => {
    const allRight = itemStatistics({ responses: [[1, 1], [1, 1], [1, 1]] });
    expect(allRight.alpha).toBeNull();
    expect(allRight.kr20).toBeNull();
    expect(allRight.sem).toBeNull();
    expect(allRight.items[0].rpb).toBeNull();
    expect(allRight.items[0].rCorrected).toBeNull();
    expect(allRight.items[0].p).toBe(1);
    expect(allRight.items[0].d).toBe(0);
    expect(allRight.sd).toBe(0);
  });

  it("a constant item among varying ones has null correlations", () => {
    const stats = itemStatistics({ responses: [[1, 0, 1], [1, 1, 1], [1, 0, 0], [1, 1, 0]] });
    expect(stats.items[0].rpb).toBeNull();
    expect(stats.items[0].rCorrected).toBeNull();
    expect(stats.items[1].rpb).not.toBeNull();
  });

  it("a single examinee has no D and a single item no reliability", () => {
    const one = itemStatistics({ responses: [[1, 0, 1]] });
    expect(one.groupSize).toBe(0);
    expect(one.items[0].d).toBeNull();
    const oneItem = itemStatistics({ responses: [[1], [0], [1]] });
    expect(oneItem.alpha).toBeNull();
    expect(oneItem.kr20).toBeNull();
  });

  it("partial credit gives α but no KR-20", () => {
    const stats = itemStatistics({ responses: [[0.5, 1, 0], [1, 1, 1], [0, 0.5, 0], [1, 0, 1]] });
    expect(stats.binary).toBe(false);
    expect(stats.kr20).toBeNull();
    expect(stats.alpha).not.toBeNull();
  });

  it("rejects ragged rows, non-finite scores and an out-of-range group size", () => {
    expect(() => itemStatistics({ responses: [[1, 0], [1]] })).toThrow(RangeError);
    expect(() => itemStatistics({ responses: [[1, Number.NaN]] })).toThrow(RangeError);
    expect(() => itemStatistics({ responses: [] })).toThrow(RangeError);
    expect(() => itemStatistics({ responses: [[1], [0], [1]], groupSize: 2 })).toThrow(RangeError);
  });

  it("the 27 % rule: halves round up and groups never exceed half of N", () => {
    // Kelley (1939) 27 %; rounding and cap are our documented rule
    expect([1, 2, 3, 4, 10, 50, 100, 10000].map(upperLowerGroupSize)).toEqual([0, 1, 1, 1, 3, 14, 27, 2700]);
  });
});

describe("itemFlags", () => {
  it("flags weak discrimination, very easy items and negative r_pb", () => {
    // thresholds: D < 0.20 poor (Ebel & Frisbie) [from memory; widely reproduced]; p > 0.95; r_pb < 0
    expect(itemFlags({ p: 0.5, d: 0.19, rpb: 0.3 })).toEqual(["low-discrimination"]);
    expect(itemFlags({ p: 0.96, d: 0.2, rpb: 0.1 })).toEqual(["too-easy"]);
    expect(itemFlags({ p: 0.5, d: -0.3, rpb: -0.1 })).toEqual(["low-discrimination", "negative-point-biserial"]);
    expect(itemFlags({ p: 0.5, d: null, rpb: null })).toEqual([]);
  });

  it("itemStatistics attaches the flags", () => {
    const stats = itemStatistics({ responses: WUENSCH });
    // item 7: D = 0 with the default groups of 3 [derived above], r_pb 0.1625 > 0 → low discrimination only
    expect(stats.items[6].flags).toEqual(["low-discrimination"]);
  });
});

describe("itemStatistics properties", () => {
  const matrix = fc
    .tuple(fc.integer({ min: 2, max: 30 }), fc.integer({ min: 2, max: 8 }))
    .chain(([n, k]) =>
      fc.array(fc.array(fc.constantFrom(0, 1), { minLength: k, maxLength: k }), { minLength: n, maxLength: n }),
    );

  it("KR-20 equals α on 0/1 items (population variance convention)", () => {
    fc.assert(
      fc.property(matrix, (responses) => {
        const stats = itemStatistics({ responses });
        if (stats.alpha === null) return stats.kr20 === null;
        return Math.abs((stats.kr20 as number) - stats.alpha) < 1e-9;
      }),
    );
  });

  it("does not depend on the order of the examinees (fractional tie rule)", () => {
    fc.assert(
      fc.property(matrix, fc.integer(), (responses, seed) => {
        const shuffled = responses
          .map((row, i) => ({ row, key: Math.sin(seed + i * 7919) }))
          .sort((x, y) => x.key - y.key)
          .map((entry) => entry.row);
        const a = itemStatistics({ responses });
        const b = itemStatistics({ responses: shuffled });
        return a.items.every((item, j) => {
          const other = b.items[j];
          const same = (x: number | null, y: number | null) => (x === null ? y === null : y !== null && Math.abs(x - y) < 1e-9);
          return same(item.d, other.d) && same(item.rpb, other.rpb) && same(item.rCorrected, other.rCorrected);
        });
      }),
    );
  });

  it("keeps correlations in [−1, 1], p in [0, 1] and D in [−1, 1]", () => {
    fc.assert(
      fc.property(matrix, (responses) => {
        const { items } = itemStatistics({ responses });
        return items.every(
          (item) =>
            item.p >= 0 &&
            item.p <= 1 &&
            (item.d === null || Math.abs(item.d) <= 1 + 1e-12) &&
            (item.rpb === null || Math.abs(item.rpb) <= 1) &&
            (item.rCorrected === null || Math.abs(item.rCorrected) <= 1),
        );
      }),
    );
  });

  it("r_pb agrees with a direct Pearson r of item and total", () => {
    fc.assert(
      fc.property(matrix, (responses) => {
        const totals = responses.map((row) => row.reduce<number>((sum, x) => sum + x, 0));
        const { items } = itemStatistics({ responses });
        return items.every((item, j) => {
          const direct = pearsonR(
            responses.map((row) => row[j]),
            totals,
          );
          return direct === null ? item.rpb === null : Math.abs((item.rpb as number) - direct) < 1e-9;
        });
      }),
    );
  });
});

describe("itemStatistics speed", () => {
  it("handles 10,000 examinees × 30 items well within the 200 ms goal", () => {
    let state = 12345;
    const next = () => ((state = (Math.imul(state, 1103515245) + 12345) >>> 0) / 4294967296);
    const responses = Array.from({ length: 10_000 }, () => Array.from({ length: 30 }, () => (next() < 0.6 ? 1 : 0)));
    itemStatistics({ responses }); // warm-up
    const timesMs = Array.from({ length: 3 }, () => {
      const start = performance.now();
      itemStatistics({ responses });
      return performance.now() - start;
    });
    // best of 3 absorbs load spikes on a shared machine; scripts/bench-item-stats.ts reports the median
    expect(Math.min(...timesMs)).toBeLessThan(200);
  });
});
