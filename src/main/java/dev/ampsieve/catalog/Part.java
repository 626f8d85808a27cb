package dev.ampsieve.catalog;

import dev.ampsieve.yaml.Located;
import java.util.List;

/**
 * One amplifier parameter set as the user typed it from a datasheet, in SI units
 * (V, A, Hz, V/s, V/√Hz, A/√Hz, V/°C; temperatures in °C; decibels as dB).
 * Optional values are null when the datasheet (or the user) did not give them; the
 * budget says in its warnings what it assumed instead.
 *
 * @param supply      total supply voltage range (V+ minus V-), volts
 * @param temperature rated ambient range, °C
 * @param inputCapacitance the capacitance one input presents: common-mode plus differential, F; null
 *                    when not given (a transimpedance budget then assumes a conservative value)
 * @param testConditions the supply and common mode of the datasheet's 25 °C table; null when not given
 * @param inputCrossover where a rail-to-rail input hands over between its input pairs, and the offset
 *                    step there; null when not given
 * @param thetaJa     junction-to-ambient thermal resistance, °C/W; null when not given
 * @param choppingRipple input-referred ripple at the chopping frequency (peak), V; null when not given
 * @param measured    the part's measured lot file, its units read only when a budget needs them; null when none
 * @param where       file and line the part was read from, for messages and reports
 */
public record Part(
        String id,
        String title,
        Architecture architecture,
        InputType input,
        FactoryTrim factoryTrim,
        boolean nullPins,
        int channels,
        List<String> packages,
        List<String> tags,
        Price price,
        Range supply,
        Range temperature,
        Spread vos,
        Spread vosDrift,
        Spread ib,
        Spread ios,
        MinTyp cmrr,
        MinTyp psrr,
        MinTyp aol,
        double gbw,
        Double slew,
        Noise noise,
        LongTermDrift longTermDrift,
        Headroom inputHeadroom,
        Headroom outputHeadroom,
        Double choppingFrequency,
        Double quiescentCurrent,
        Double inputCapacitance,
        TestConditions testConditions,
        InputCrossover inputCrossover,
        Double thetaJa,
        Double choppingRipple,
        Measured measured,
        String source,
        String notes,
        Located where) {

    public Part {
        packages = packages == null ? List.of() : List.copyOf(packages);
        tags = tags == null ? List.of() : List.copyOf(tags);
        vosDrift = vosDrift == null ? Spread.NONE : vosDrift;
        ib = ib == null ? Spread.NONE : ib;
        ios = ios == null ? Spread.NONE : ios;
        cmrr = cmrr == null ? MinTyp.NONE : cmrr;
        psrr = psrr == null ? MinTyp.NONE : psrr;
        aol = aol == null ? MinTyp.NONE : aol;
        noise = noise == null ? Noise.NONE : noise;
        factoryTrim = factoryTrim == null ? FactoryTrim.NONE : factoryTrim;
        title = title == null ? "" : title;
        source = source == null ? "" : source;
        notes = notes == null ? "" : notes;
    }

    /** Chopper and auto-zero parts correct their own offset continuously. */
    public boolean selfCorrecting() {
        return architecture != Architecture.STANDARD;
    }

    /** This part with {@code m} as its measured lot (a lot read for a budget, or one given on the command line). */
    public Part withMeasured(Measured m) {
        return new Part(
                id,
                title,
                architecture,
                input,
                factoryTrim,
                nullPins,
                channels,
                packages,
                tags,
                price,
                supply,
                temperature,
                vos,
                vosDrift,
                ib,
                ios,
                cmrr,
                psrr,
                aol,
                gbw,
                slew,
                noise,
                longTermDrift,
                inputHeadroom,
                outputHeadroom,
                choppingFrequency,
                quiescentCurrent,
                inputCapacitance,
                testConditions,
                inputCrossover,
                thetaJa,
                choppingRipple,
                m,
                source,
                notes,
                where);
    }

    /** Price per unit for a build of {@code quantity}, from the catalog's price breaks ({@link Price#at}). */
    public double unitPrice(int quantity) {
        return price.at(quantity);
    }
}
