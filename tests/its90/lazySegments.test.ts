/**
 * The exact inverse builds its segments one at a time, when an EMF first falls in one (so the first
 * conversion of a type does not pay for the whole table). Each segment is fitted on its own, so the bits
 * must not depend on which segments were built before or in which order: property over many inputs, all
 * eight types (forward functions of NIST SRD 60 / Monograph 175), lazy tables reached in a scrambled order
 * against tables with every segment built in order first. Not a published source: a self-consistency
 * property of the construction.
 */
import { describe, expect, it } from "vitest";
import { _compile, type CompiledType } from "../../src/its90/compiled.js";
import { _completeExactInverse, _eagerExactInverse, _exactInverse, _exactInverseTables } from "../../src/its90/exactInverse.js";
import { thermocoupleData, thermocoupleTypes } from "../../src/its90/resolveType.js";

/** The same compiled type with no tables yet. */
function withoutTables(ct: CompiledType): CompiledType {
  const { inverse: _tables, ...rest } = ct;
  return rest;
}

describe("lazily built exact-inverse segments", () => {
  it("give the same bits as tables built all at once, whatever order the segments are reached in", () => {
    let compared = 0;
    for (const letter of thermocoupleTypes) {
      const data = thermocoupleData(letter);
      const ct = _compile(data);
      // A fresh compiled type with empty tables, reached in a scrambled order (a linear congruential walk).
      const lazy = _exactInverseTables(withoutTables(ct));
      const eager = _eagerExactInverse(ct);
      const lo = ct.emfAtMinC;
      const span = ct.emfAtMaxC - lo;
      const n = 20_000;
      let state = 987_654_321 + letter.charCodeAt(0);
      for (let i = 0; i < n; i++) {
        state = (state * 1_103_515_245 + 12_345) % 2_147_483_648;
        const emf = lo + span * ((state + 0.5) / 2_147_483_648);
        if (!(emf > ct.emfAtMinC && emf <= ct.emfAtMaxC)) continue;
        const a = _exactInverse(ct, lazy, emf);
        const b = _exactInverse(ct, eager, emf);
        if (!Object.is(a, b)) expect({ letter, emf, lazy: a, eager: b }).toBeUndefined();
        compared++;
      }
      // Every segment edge, after the scrambled walk has built a part of the table.
      _completeExactInverse(ct, lazy);
      for (const [p, piece] of lazy.pieces.entries()) {
        const other = eager.pieces[p];
        expect(other?.count).toBe(piece.count);
        expect(Array.from(piece.edgesC)).toEqual(Array.from(other?.edgesC ?? []));
        expect(Array.from(piece.coefficients)).toEqual(Array.from(other?.coefficients ?? []));
        expect(Array.from(piece.state)).toEqual(Array.from(other?.state ?? []));
      }
    }
    expect(compared).toBeGreaterThan(150_000);
  });

  it("a first conversion builds one segment, not the type's table", () => {
    const ct = _compile(thermocoupleData("K"));
    const inv = _exactInverseTables(withoutTables(ct));
    _exactInverse(ct, inv, 20.644);
    const built = inv.pieces.reduce((sum, piece) => sum + piece.state.reduce((s, v) => s + (v === 0 ? 0 : 1), 0), 0);
    expect(built).toBe(1);
  });
});
