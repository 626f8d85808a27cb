package dev.ampsieve.units;

/**
 * Every physical constant the tool uses, in one place. Values from the BIPM SI Brochure,
 * 9th edition (2019), where k and e are exact by definition.
 */
public final class PhysicalConstants {
    private PhysicalConstants() {}

    /** Boltzmann constant k, J/K, exact (SI Brochure 9th ed., 2019). */
    public static final double BOLTZMANN = 1.380649e-23;

    /** Elementary charge e, C, exact (SI Brochure 9th ed., 2019). */
    public static final double ELEMENTARY_CHARGE = 1.602176634e-19;

    /** 0 °C in kelvin (SI Brochure 9th ed.: T = t + 273.15). */
    public static final double ZERO_CELSIUS_KELVIN = 273.15;

    /** 25 °C in kelvin: the datasheet reference temperature, used for noise and drift estimates. */
    public static final double ROOM_KELVIN = 25.0 + ZERO_CELSIUS_KELVIN;

    /** Absolute temperature in kelvin of {@code celsius}. */
    public static double kelvin(double celsius) {
        return celsius + ZERO_CELSIUS_KELVIN;
    }
}
