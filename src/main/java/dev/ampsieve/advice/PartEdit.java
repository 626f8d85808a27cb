package dev.ampsieve.advice;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Spread;

/**
 * Copies of a part with one catalog figure replaced, for "what part would fit" searches. The
 * copy keeps nothing of the original that a different part could not be counted on to have:
 * the offset's over-temperature maximum (which caps the drift) and the offset current are
 * dropped where the changed figure would make them stale, so the engine's own rules for an
 * absent figure (never flattering) apply to them.
 */
final class PartEdit {
    private PartEdit() {}

    /** A typical value no larger than the new maximum (the Monte Carlo reads typ as a sigma floor). */
    private static Double cappedTyp(Double typ, double max) {
        return typ == null ? null : Math.min(Math.abs(typ), max);
    }

    /**
     * IB at most {@code ib} at 25 °C and over the range (the over-temperature maximum set to the
     * same value, so no temperature rule raises it), and IOS removed: the engine then takes it
     * equal to IB, its reading for a part that does not give it.
     */
    static Part withIb(Part p, double ib) {
        Spread s = new Spread(cappedTyp(p.ib().typ(), ib), ib, ib);
        return copy(p, p.vos(), p.vosDrift(), s, null);
    }

    /**
     * vos.max = {@code vos}, with the over-temperature maximum dropped (it belongs to the closest
     * part) and the drift figures set to {@code drift} (the closest part's, or the bound the
     * engine used for it), so that a drift estimated from the offset does not shrink with it.
     */
    static Part withVos(Part p, double vos, Spread drift) {
        Spread s = new Spread(cappedTyp(p.vos().typ(), vos), vos, null);
        return copy(p, s, drift, p.ib(), p.ios());
    }

    /** vos-drift.max = {@code drift}; the offset's over-temperature maximum dropped (it would cap the drift). */
    static Part withDrift(Part p, double drift) {
        Spread v = p.vos();
        Double max = v.max() != null ? v.max() : v.typ() == null ? v.maxOverTemp() : null;
        Spread vos = new Spread(v.typ(), max, null);
        Spread d = new Spread(cappedTyp(p.vosDrift().typ(), drift), drift, null);
        return copy(p, vos, d, p.ib(), p.ios());
    }

    /** The part with its junction-to-ambient thermal resistance replaced (a cooler package). */
    static Part withThetaJa(Part p, double thetaJa) {
        return new Part(
                p.id(),
                p.title(),
                p.architecture(),
                p.input(),
                p.factoryTrim(),
                p.nullPins(),
                p.channels(),
                p.packages(),
                p.tags(),
                p.price(),
                p.supply(),
                p.temperature(),
                p.vos(),
                p.vosDrift(),
                p.ib(),
                p.ios(),
                p.cmrr(),
                p.psrr(),
                p.aol(),
                p.gbw(),
                p.slew(),
                p.noise(),
                p.longTermDrift(),
                p.inputHeadroom(),
                p.outputHeadroom(),
                p.choppingFrequency(),
                p.quiescentCurrent(),
                p.inputCapacitance(),
                p.testConditions(),
                p.inputCrossover(),
                thetaJa,
                p.choppingRipple(),
                p.measured(),
                p.source(),
                p.notes(),
                p.where());
    }

    /** The part with its four DC figures replaced (tests derive parts with an over-temperature figure through it). */
    static Part copy(Part p, Spread vos, Spread drift, Spread ib, Spread ios) {
        return new Part(
                p.id(),
                p.title(),
                p.architecture(),
                p.input(),
                p.factoryTrim(),
                p.nullPins(),
                p.channels(),
                p.packages(),
                p.tags(),
                p.price(),
                p.supply(),
                p.temperature(),
                vos,
                drift,
                ib,
                ios,
                p.cmrr(),
                p.psrr(),
                p.aol(),
                p.gbw(),
                p.slew(),
                p.noise(),
                p.longTermDrift(),
                p.inputHeadroom(),
                p.outputHeadroom(),
                p.choppingFrequency(),
                p.quiescentCurrent(),
                p.inputCapacitance(),
                p.testConditions(),
                p.inputCrossover(),
                p.thetaJa(),
                p.choppingRipple(),
                p.measured(),
                p.source(),
                p.notes(),
                p.where());
    }
}
