package dev.ampsieve.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class PhysicalConstantsTest {

    @Test
    void exactSiValues() {
        // BIPM SI Brochure, 9th ed. (2019): exact by definition
        assertEquals(1.380649e-23, PhysicalConstants.BOLTZMANN, 0.0);
        assertEquals(1.602176634e-19, PhysicalConstants.ELEMENTARY_CHARGE, 0.0);
        assertEquals(298.15, PhysicalConstants.ROOM_KELVIN, 1e-12);
    }

    @Test
    void fourKTAndThermalVoltage() {
        double k = PhysicalConstants.BOLTZMANN;
        // reference-checks §1 [Calc from SI9]: 4kT at 25 °C 1.646562e-20 J, at 27 °C 1.657607e-20 J
        assertEquals(1.646562e-20, 4 * k * PhysicalConstants.kelvin(25), 0.5e-26);
        assertEquals(1.657607e-20, 4 * k * PhysicalConstants.kelvin(27), 0.5e-26);
        // kT/q at 25 °C = 25.6926 mV (reference-checks §1)
        assertEquals(25.6926e-3, k * 298.15 / PhysicalConstants.ELEMENTARY_CHARGE, 0.5e-7);
    }
}
