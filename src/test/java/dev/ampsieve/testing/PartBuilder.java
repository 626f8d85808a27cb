package dev.ampsieve.testing;

import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.FactoryTrim;
import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.LongTermDrift;
import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Noise;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.yaml.Located;
import java.nio.file.Path;
import java.util.List;

/** Invented parts for tests: generic ids, made-up values; only what a test sets differs from the defaults. */
public final class PartBuilder {
    private String id;
    private String title = "";
    private Architecture architecture = Architecture.STANDARD;
    private InputType input = InputType.BIPOLAR;
    private FactoryTrim factoryTrim = FactoryTrim.NONE;
    private int channels = 1;
    private List<String> packages = List.of();
    private List<String> tags = List.of();
    private Price price = new Price(1.0, 1000, "USD");
    private Range supply = new Range(2.7, 36);
    private Range temperature = new Range(-40, 125);
    private Spread vos = new Spread(null, 1e-3, null);
    private Spread drift = Spread.NONE;
    private Spread ib = Spread.NONE;
    private Spread ios = Spread.NONE;
    private MinTyp cmrr = MinTyp.NONE;
    private MinTyp psrr = MinTyp.NONE;
    private MinTyp aol = MinTyp.NONE;
    private double gbw = 1e6;
    private Double slew;
    private Noise noise = Noise.NONE;
    private LongTermDrift aging;
    private Headroom inputHeadroom = new Headroom(1.5, 1.5);
    private Headroom outputHeadroom = new Headroom(1.0, 1.0);
    private Double fchop;
    private Double iq;
    private Double cin;
    /** The datasheet table at 5 V, mid-supply: the default stage of {@code StageBuilder}, so the operating point moves nothing. */
    private dev.ampsieve.catalog.TestConditions testConditions = new dev.ampsieve.catalog.TestConditions(5.0, 2.5);

    private dev.ampsieve.catalog.InputCrossover crossover;
    private Double thetaJa;
    private Double ripple;
    private dev.ampsieve.catalog.Measured measured;
    private String notes = "";

    private PartBuilder(String id) {
        this.id = id;
    }

    public static PartBuilder part(String id) {
        return new PartBuilder(id);
    }

    public PartBuilder title(String v) {
        title = v;
        return this;
    }

    public PartBuilder architecture(Architecture v) {
        architecture = v;
        return this;
    }

    public PartBuilder input(InputType v) {
        input = v;
        return this;
    }

    public PartBuilder factoryTrim(FactoryTrim v) {
        factoryTrim = v;
        return this;
    }

    public PartBuilder channels(int v) {
        channels = v;
        return this;
    }

    public PartBuilder packages(String... v) {
        packages = List.of(v);
        return this;
    }

    public PartBuilder tags(String... v) {
        tags = List.of(v);
        return this;
    }

    public PartBuilder price(double unit) {
        price = new Price(unit, 1000, "USD");
        return this;
    }

    public PartBuilder price(Price v) {
        price = v;
        return this;
    }

    public PartBuilder noPrice() {
        price = null;
        return this;
    }

    public PartBuilder supply(double min, double max) {
        supply = new Range(min, max);
        return this;
    }

    public PartBuilder temperature(double min, double max) {
        temperature = new Range(min, max);
        return this;
    }

    public PartBuilder vos(Double typ, Double max) {
        vos = new Spread(typ, max, null);
        return this;
    }

    public PartBuilder drift(Double typ, Double max) {
        drift = new Spread(typ, max, null);
        return this;
    }

    public PartBuilder ib(Double typ, Double max) {
        ib = new Spread(typ, max, null);
        return this;
    }

    public PartBuilder ios(Double typ, Double max) {
        ios = new Spread(typ, max, null);
        return this;
    }

    public PartBuilder cmrr(Double min, Double typ) {
        cmrr = new MinTyp(min, typ);
        return this;
    }

    public PartBuilder psrr(Double min, Double typ) {
        psrr = new MinTyp(min, typ);
        return this;
    }

    public PartBuilder aol(Double min, Double typ) {
        aol = new MinTyp(min, typ);
        return this;
    }

    public PartBuilder gbw(double v) {
        gbw = v;
        return this;
    }

    public PartBuilder slew(double v) {
        slew = v;
        return this;
    }

    public PartBuilder noise(Double en, Double enCorner, Double in, Double inCorner) {
        noise = new Noise(en, enCorner, in, inCorner);
        return this;
    }

    public PartBuilder aging(double value, double per) {
        aging = new LongTermDrift(value, per);
        return this;
    }

    public PartBuilder inputHeadroom(double low, double high) {
        inputHeadroom = new Headroom(low, high);
        return this;
    }

    public PartBuilder outputHeadroom(double low, double high) {
        outputHeadroom = new Headroom(low, high);
        return this;
    }

    public PartBuilder fchop(double v) {
        fchop = v;
        return this;
    }

    public PartBuilder iq(double v) {
        iq = v;
        return this;
    }

    public PartBuilder inputCapacitance(Double v) {
        cin = v;
        return this;
    }

    public PartBuilder testConditions(Double supply, Double commonMode) {
        testConditions = supply == null && commonMode == null
                ? null
                : new dev.ampsieve.catalog.TestConditions(supply, commonMode);
        return this;
    }

    public PartBuilder crossover(double fromPositiveRail, double step) {
        crossover = new dev.ampsieve.catalog.InputCrossover(fromPositiveRail, step);
        return this;
    }

    public PartBuilder thetaJa(Double v) {
        thetaJa = v;
        return this;
    }

    public PartBuilder choppingRipple(Double v) {
        ripple = v;
        return this;
    }

    /** A measured lot (issue 16). */
    public PartBuilder measured(dev.ampsieve.catalog.Measured m) {
        measured = m;
        return this;
    }

    public PartBuilder notes(String v) {
        notes = v;
        return this;
    }

    public PartBuilder nullPins(boolean v) {
        nullPins = v;
        return this;
    }

    public PartBuilder source(String v) {
        source = v;
        return this;
    }

    private boolean nullPins;
    private String source = "test fixture";

    public Part build() {
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
                drift,
                ib,
                ios,
                cmrr,
                psrr,
                aol,
                gbw,
                slew,
                noise,
                aging,
                inputHeadroom,
                outputHeadroom,
                fchop,
                iq,
                cin,
                testConditions,
                crossover,
                thetaJa,
                ripple,
                measured,
                source,
                notes,
                new Located(Path.of("fixture.yaml"), 1, 1));
    }
}
