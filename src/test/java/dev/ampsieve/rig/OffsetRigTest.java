package dev.ampsieve.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The offset rig's sizing and its error, worked by hand; E96 against IEC 60063. */
class OffsetRigTest {

    @Test
    void sizedForAPrecisionBipolarPartByHand() {
        // vos 25 µV, ib 2 nA, ios 1.5 nA, AOL 126 dB = 1,995,262 V/V, a 2 V meter with 10 µV counts, 0.1 %
        // resistors. Caps: range 0.5 x 2 / 25 µV = 40,000; loop 1e-3 x 1,995,262 = 1995.3; 10,000 -> 1995.3.
        // R1 = E96 at or above max(10, 10k / 1994.3 = 5.01) = 10.0 ohm; R2 = E96 at or below 10 x 1994.3 =
        // 19,943 -> 19.6 kohm; G = 1 + 19600/10 = 1961; R1||R2 = 196000/19610 = 9.99490; Rp = 10.0 ohm.
        // gain error 25 µV x (1960/1961 x 0.002 + 1961/1,995,262) = 25 µV x 0.0029818 = 74.545 nV
        // bias error 1.5 nA x 9.99490 x 1.001 + 2 nA x (0.00510 + 0.001 x 19.9949) = 15.0073 + 0.0502 = 15.0575 nV
        // resolution 10 µV / 1961 = 5.0994 nV; total 94.702 nV
        double aol = Math.pow(10, 126 / 20.0);
        OffsetRig r = OffsetRig.plan(25e-6, 2e-9, 1.5e-9, aol, 2.0, 10e-6, 1e-3, List.of());
        assertEquals(OffsetRig.Limit.OPEN_LOOP_GAIN, r.limitedBy());
        assertEquals(10.0, r.r1(), 1e-12);
        assertEquals(19.6e3, r.r2(), 1e-9);
        assertEquals(10.0, r.rp(), 1e-12);
        assertEquals(1961.0, r.gain(), 1e-9);
        assertEquals(74.545e-9, r.gainError(), 0.001e-9);
        assertEquals(15.0575e-9, r.biasError(), 0.0001e-9);
        assertEquals(5.0994e-9, r.inputResolution(), 0.0001e-9);
        assertEquals(94.702e-9, r.totalError(), 0.001e-9);
        // full reading 1961 x (25 µV + 15.06 nV) = 49.055 mV: 2.5 % of the range; one count 0.02 % of vos
        assertEquals(49.055e-3, r.fullReading(), 0.001e-3);
        assertTrue(r.fitsRange());
        assertTrue(r.resolves());
    }

    @Test
    void aLargeOffsetIsLimitedByTheMeterAndASmallRangeIsSaid() {
        // vos 3 mV on a 200 mV range: cap 0.5 x 0.2 / 3 mV = 33.33; R1 = E96 >= 10k / 32.33 = 309.3 -> 316 ohm
        // (309 is below); R2 = E96 <= 316 x 32.33 = 10,217 -> 10.2 kohm; G = 1 + 10200/316 = 33.278
        OffsetRig r = OffsetRig.plan(3e-3, 10e-12, 10e-12, 1e6, 0.2, 10e-6, 1e-3, List.of("ib"));
        assertEquals(OffsetRig.Limit.METER_RANGE, r.limitedBy());
        assertEquals(316.0, r.r1(), 1e-9);
        assertEquals(10.2e3, r.r2(), 1e-9);
        assertEquals(1 + 10200 / 316.0, r.gain(), 1e-12);
        assertTrue(r.fullReading() <= 0.5 * 0.2 + 1e-6);
        // 10 µV / 33.28 = 0.30 µV: 0.01 % of 3 mV, resolved
        assertTrue(r.resolves());
        OffsetRig coarse = OffsetRig.plan(3e-3, 10e-12, 10e-12, 1e6, 0.2, 5e-3, 1e-3, List.of());
        assertFalse(coarse.resolves()); // 5 mV / 33.28 = 150 µV, 5 % of the offset limit
        OffsetRig tiny = OffsetRig.plan(3e-3, 10e-12, 10e-12, 1e6, 3e-3, 1e-6, 1e-3, List.of());
        assertEquals(2.0, tiny.gain(), 1e-12); // the floor R2 = R1
        assertFalse(tiny.fitsRange()); // 2 x 3 mV > 3 mV
    }
}
