package dev.ampsieve.testing;

import static dev.ampsieve.testing.PartBuilder.part;

import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.FactoryTrim;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.Part;
import java.nio.file.Path;
import java.util.List;

/** Eight invented parts spanning the query fields; values are made up, ids generic. */
public final class FixtureCatalog {
    private FixtureCatalog() {}

    public static List<Part> parts() {
        return List.of(
                part("PX-101")
                        .title("general-purpose bipolar amplifier")
                        .tags("general")
                        .vos(0.5e-3, 2e-3)
                        .drift(5e-6, null)
                        .ib(30e-9, 100e-9)
                        .ios(null, 20e-9)
                        .cmrr(80.0, 95.0)
                        .psrr(85.0, null)
                        .aol(100.0, 110.0)
                        .gbw(1e6)
                        .slew(0.5e6)
                        .noise(20e-9, 10.0, 0.5e-12, null)
                        .supply(5, 36)
                        .temperature(-40, 85)
                        .price(0.30)
                        .iq(0.5e-3)
                        .packages("so-8", "sot-23-5")
                        .inputHeadroom(0, 1.5)
                        .build(),
                part("PX-202")
                        .title("precision low-drift bipolar")
                        .tags("precision")
                        .factoryTrim(FactoryTrim.LASER)
                        .vos(10e-6, 25e-6)
                        .drift(0.1e-6, 0.6e-6)
                        .ib(0.5e-9, 2e-9)
                        .cmrr(120.0, 130.0)
                        .gbw(0.6e6)
                        .noise(9e-9, 3.0, null, null)
                        .supply(4, 36)
                        .temperature(-40, 125)
                        .price(2.40)
                        .packages("so-8")
                        .build(),
                part("PX-303")
                        .title("low-power rail-to-rail quad")
                        .input(InputType.CMOS)
                        .channels(4)
                        .tags("low-power")
                        .vos(null, 3e-3)
                        .drift(2e-6, null)
                        .ib(1e-12, 10e-12)
                        .gbw(10e6)
                        .noise(15e-9, null, null, null)
                        .supply(1.8, 5.5)
                        .temperature(-40, 125)
                        .price(0.45)
                        .packages("tssop-14")
                        .inputHeadroom(0, 0)
                        .outputHeadroom(0, 0)
                        .build(),
                part("PX-404")
                        .title("chopper amplifier")
                        .architecture(Architecture.CHOPPER)
                        .input(InputType.CMOS)
                        .tags("precision")
                        .vos(1e-6, 5e-6)
                        .drift(null, 0.02e-6)
                        .ib(null, 200e-12)
                        .noise(22e-9, null, 100e-15, null)
                        .gbw(2e6)
                        .fchop(20e3)
                        .supply(2.7, 5.5)
                        .temperature(-40, 125)
                        .price(1.80)
                        .packages("sot-23-5")
                        .outputHeadroom(0, 0)
                        .build(),
                part("PX-505")
                        .title("micropower auto-zero")
                        .architecture(Architecture.AUTO_ZERO)
                        .input(InputType.CMOS)
                        .vos(null, 10e-6)
                        .drift(null, 0.05e-6)
                        .ib(null, 100e-12)
                        .gbw(0.35e6)
                        .supply(1.8, 5.5)
                        .temperature(-40, 85)
                        .price(1.10)
                        .packages("sc-70")
                        .inputHeadroom(-0.1, -0.1)
                        .outputHeadroom(0, 0)
                        .iq(20e-6)
                        .build(),
                part("PX-606")
                        .title("low-noise audio amplifier")
                        .input(InputType.JFET)
                        .vos(null, 1e-3)
                        .drift(4e-6, null)
                        .ib(null, 50e-12)
                        .noise(4e-9, 50.0, null, null)
                        .gbw(8e6)
                        .slew(20e6)
                        .supply(9, 36)
                        .temperature(0, 70)
                        .price(1.20)
                        .packages("so-8")
                        .channels(2)
                        .build(),
                part("PX-707")
                        .title("high-voltage amplifier")
                        .vos(150e-6, null)
                        .gbw(0.8e6)
                        .supply(10, 40)
                        .temperature(-55, 125)
                        .price(3.10)
                        .packages("to-99")
                        .notes("only a typical offset given")
                        .build(),
                part("PX-808")
                        .title("fast cmos amplifier")
                        .input(InputType.CMOS)
                        .vos(null, 1.5e-3)
                        .gbw(50e6)
                        .slew(40e6)
                        .supply(2.5, 5.5)
                        .temperature(-40, 125)
                        .price(0.95)
                        .packages("sot-23-6")
                        .build());
    }

    public static Catalog catalog(Path root) {
        return new Catalog(root, parts(), List.of(), 1);
    }
}
