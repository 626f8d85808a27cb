package dev.ampsieve.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads and prints quantities written the way datasheets write them: {@code 2.5 uV},
 * {@code 0.6 µV/°C}, {@code 12 nV/rtHz}, {@code 0.5 V/us}, {@code 10k}, {@code 110 dB}.
 *
 * <p>SI prefixes follow the SI Brochure (BIPM, 9th edition, 2019, table 7): f 1e-15,
 * p 1e-12, n 1e-9, u/µ 1e-6, m 1e-3, k 1e3, M 1e6, G 1e9, T 1e12. Prefixes are
 * case-sensitive as in the brochure (m milli, M mega); {@code K} is also read as kilo
 * before a unit (as in "KHz", a common misspelling: no SI prefix K exists), never in a
 * temperature field. A prefix in the wrong case that has no reading ({@code 10 UV}) is refused
 * with the spelling that exists ({@code 10 uV}). Unit symbols after the prefix are read
 * case-blind where that is unambiguous: {@code 10uv}, {@code 1.5 MHZ}, {@code 10 KOHM},
 * {@code 110 DB}; so {@code 10 mv} is 10 millivolts and {@code 10 MV} 10 megavolts (which the
 * plausibility bounds then refuse in any op amp field).
 *
 * <p>A unit is read as numerator[/denominator], each with an optional prefix, so
 * {@code V/us} is volts per microsecond. The dimension expected by the field decides
 * whether a value is accepted; a mismatch names both dimensions.
 *
 * <p>Time: h = 3600 s; y = Julian year of 365.25 days (8766 h); month = y/12 (730.5 h).
 */
public final class Units {

    private Units() {}

    /** 0 K in degrees Celsius (SI Brochure, 9th ed., 2.3.1: t/°C = T/K - 273.15). */
    private static final double ABSOLUTE_ZERO_C = -273.15;

    private static final Pattern QUANTITY =
            Pattern.compile("^\\s*([-+]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*$");

    private static final Map<String, Double> PREFIXES = new LinkedHashMap<>();

    /** A digit 1-9 in the mantissa (before any exponent): the number is not zero. */
    /** A gain written as a ratio (V/mV) where dB is asked; compiled once, as every pattern read per value. */
    private static final Pattern GAIN_RATIO = Pattern.compile("V/[mµu]?V");

    private static final Pattern NONZERO_DIGIT = Pattern.compile("^[-+]?[0-9.]*[1-9]");

    static {
        PREFIXES.put("f", 1e-15);
        PREFIXES.put("p", 1e-12);
        PREFIXES.put("n", 1e-9);
        PREFIXES.put("u", 1e-6);
        PREFIXES.put("µ", 1e-6); // U+00B5 MICRO SIGN
        PREFIXES.put("μ", 1e-6); // U+03BC GREEK SMALL LETTER MU
        PREFIXES.put("m", 1e-3);
        PREFIXES.put("k", 1e3);
        PREFIXES.put("K", 1e3);
        PREFIXES.put("M", 1e6);
        PREFIXES.put("G", 1e9);
        PREFIXES.put("T", 1e12);
    }

    /** Base unit symbols (numerator side) and what they measure. */
    private enum Base {
        VOLT,
        AMPERE,
        OHM,
        FARAD,
        HERTZ,
        DECIBEL,
        CELSIUS,
        KELVIN,
        PERCENT,
        PPM,
        SECOND,
        HOUR,
        YEAR,
        MONTH,
        DAY,
        NONE,
        ROOT_HERTZ,
        WATT
    }

    private record Unit(Base base, double factor) {}

    private static final Map<String, Base> BASES = new LinkedHashMap<>();

    static {
        BASES.put("V", Base.VOLT);
        BASES.put("A", Base.AMPERE);
        // U+03A9 GREEK CAPITAL LETTER OMEGA and U+2126 OHM SIGN: keyboards and fonts produce either
        for (String s : new String[] {"ohm", "ohms", "Ohm", "Ohms", "\u03a9", "\u2126", "R"}) {
            BASES.put(s, Base.OHM);
        }
        BASES.put("F", Base.FARAD);
        BASES.put("Hz", Base.HERTZ);
        BASES.put("hz", Base.HERTZ);
        BASES.put("dB", Base.DECIBEL);
        for (String s : new String[] {"C", "°C", "degC", "℃"}) {
            BASES.put(s, Base.CELSIUS);
        }
        BASES.put("K", Base.KELVIN);
        BASES.put("%", Base.PERCENT);
        BASES.put("ppm", Base.PPM);
        BASES.put("s", Base.SECOND);
        BASES.put("h", Base.HOUR);
        BASES.put("hr", Base.HOUR);
        BASES.put("hours", Base.HOUR);
        BASES.put("y", Base.YEAR);
        BASES.put("yr", Base.YEAR);
        BASES.put("years", Base.YEAR);
        BASES.put("month", Base.MONTH);
        BASES.put("months", Base.MONTH);
        BASES.put("d", Base.DAY);
        BASES.put("days", Base.DAY);
        BASES.put("W", Base.WATT); // only under a degree, for a thermal resistance (°C/W)
        for (String s : new String[] {"rtHz", "√Hz", "sqrt(Hz)", "sqrtHz", "Hz^0.5", "Hz^(1/2)", "rthz"}) {
            BASES.put(s, Base.ROOT_HERTZ);
        }
    }

    /** Base symbols read case-blind (see {@link #base}). */
    private static final Map<String, Base> BASES_FOLDED = new LinkedHashMap<>();

    static {
        for (Map.Entry<String, Base> e : BASES.entrySet()) {
            String k = e.getKey();
            // one-letter symbols stay as written except V, A and C, which nothing else could mean here
            if (k.length() > 1 || k.equals("V") || k.equals("A") || k.equals("C")) {
                BASES_FOLDED.putIfAbsent(k.toLowerCase(Locale.ROOT), e.getValue());
            }
        }
    }

    /** The SI prefixes read, with their factors, in order (for the reference page). */
    public static Map<String, Double> prefixes() {
        return java.util.Collections.unmodifiableMap(PREFIXES);
    }

    /** Every unit symbol read as written (before any prefix), in order (for the reference page). */
    public static java.util.List<String> symbols() {
        return java.util.List.copyOf(BASES.keySet());
    }

    /** Bases that take no SI prefix (a prefix on them would be a typo). */
    private static boolean prefixable(Base b) {
        return switch (b) {
            case VOLT, AMPERE, OHM, FARAD, HERTZ, SECOND, ROOT_HERTZ -> true;
            default -> false;
        };
    }

    /**
     * Parses {@code text} as a quantity of dimension {@code expected} and returns it in SI
     * base units (temperatures in °C).
     *
     * @throws UnitException naming what was found and an example of what to write
     */
    public static double parse(String text, Dimension expected) throws UnitException {
        return parse(text, expected, expected.example());
    }

    /**
     * As {@link #parse(String, Dimension)}, with {@code example} as the well-formed value an error
     * suggests: a field's own example ({@code 5 V} for a supply) reads better than the dimension's.
     */
    public static double parse(String text, Dimension expected, String example) throws UnitException {
        if (example == null || example.isBlank()) {
            example = example;
        }
        if (text == null || text.isBlank()) {
            throw new UnitException("empty value", "write " + expected.noun() + " such as '" + example + "'");
        }
        String t = text.strip();
        String lower = t.toLowerCase(Locale.ROOT);
        if (lower.contains("nan") || lower.contains("inf")) {
            throw new UnitException(
                    "'" + t + "' is not a finite number", "write " + expected.noun() + " such as '" + example + "'");
        }
        Matcher m = QUANTITY.matcher(t);
        if (!m.matches()) {
            throw new UnitException(
                    "'" + t + "' does not start with a number",
                    "write " + expected.noun() + " such as '" + example + "'");
        }
        double number = Double.parseDouble(m.group(1));
        String unitText = m.group(2);
        if (expected == Dimension.DECIBEL
                && GAIN_RATIO.matcher(unitText.replace(" ", "")).matches()) {
            throw gainAsRatio(t, number, unitText.replace(" ", ""));
        }
        double value = number * interpret(unitText, expected, t, example);
        if (expected == Dimension.TEMPERATURE && isKelvin(unitText)) {
            value = number - 273.15;
        }
        if (!Double.isFinite(value)) {
            // 1e400 V, or 1e308 kV: past the largest double (about 1.8e308) the value would be infinite
            throw new UnitException(
                    "'" + t + "' is out of range: beyond the largest number (about 1.8e308 in SI units)",
                    "check the exponent and the prefix; write " + expected.noun() + " such as '" + example + "'");
        }
        if (value == 0 && number != 0
                || number == 0 && NONZERO_DIGIT.matcher(m.group(1)).find()) {
            // 1e-400 V would silently read as 0 V
            throw new UnitException(
                    "'" + t + "' is out of range: below the smallest number (about 1e-308 in SI units)",
                    "check the exponent and the prefix; write 0 if you mean zero");
        }
        if (expected == Dimension.TEMPERATURE && value < ABSOLUTE_ZERO_C) {
            throw new UnitException(
                    "'" + t + "' is below absolute zero (-273.15 °C)",
                    "write the temperature in °C, such as '" + example + "'");
        }
        return value;
    }

    /**
     * Datasheets often state open-loop gain as V/mV or V/µV; the catalog keeps decibels, so the
     * fix gives the converted figure (20 log10 of the ratio) rather than only the rule.
     */
    private static UnitException gainAsRatio(String whole, double number, String unit) {
        double perVolt = unit.endsWith("/mV") ? 1e3 : unit.endsWith("/V") && unit.length() == 3 ? 1 : 1e6;
        double ratio = number * perVolt;
        if (!(ratio > 0) || !Double.isFinite(ratio)) {
            return new UnitException(
                    "'" + whole + "' is a gain ratio; this field takes decibels",
                    "write the gain in dB: 20 log10 of the ratio in V/V");
        }
        // rounded down to 0.1 dB: a guaranteed minimum must not grow in the conversion
        double db = Math.floor(200 * Math.log10(ratio) + 1e-9) / 10;
        return new UnitException(
                "'" + whole + "' is a gain ratio; this field takes decibels",
                "write '" + trim(String.format(Locale.ROOT, "%.1f", db)) + " dB' (20 log10 of "
                        + (ratio >= PLAIN_MAX
                                ? scientific(ratio, 6)
                                : new BigDecimal(ratio)
                                        .round(new MathContext(6))
                                        .stripTrailingZeros()
                                        .toPlainString())
                        + " V/V)");
    }

    private static boolean isKelvin(String unitText) {
        return unitText.equals("K");
    }

    /** Returns the factor to SI for {@code unitText} in a field of dimension {@code expected}. */
    private static double interpret(String unitText, Dimension expected, String whole, String example)
            throws UnitException {
        String u = unitText.replace(" ", "");
        if (u.isEmpty()) {
            return switch (expected) {
                case NUMBER, RATIO, DECIBEL, RESISTANCE -> 1.0;
                default ->
                    throw new UnitException(
                            "'" + whole + "' has no unit",
                            "write " + expected.noun() + " with its unit, such as '" + example + "'");
            };
        }
        if (expected == Dimension.TEMPERATURE && u.equals("K")) {
            return 1.0;
        }
        // a bare prefix: "10k" for a resistance, "2M" for 2 Mohm
        if (expected == Dimension.RESISTANCE && PREFIXES.containsKey(u)) {
            return PREFIXES.get(u);
        }
        String num = u;
        String den = null;
        int slash = u.indexOf('/');
        if (slash >= 0) {
            num = u.substring(0, slash);
            den = u.substring(slash + 1);
        }
        Unit n = num.isEmpty() && den != null ? new Unit(Base.NONE, 1.0) : unit(num, whole, expected, example);
        Unit d = den == null ? null : unit(den, whole, expected, example);
        Dimension found = dimensionOf(n.base(), d == null ? null : d.base());
        if (found == null) {
            throw new UnitException(
                    "unit '" + unitText + "' in '" + whole + "' is not one this tool reads",
                    "write " + expected.noun() + " such as '" + example + "'");
        }
        if (found != expected && !(expected == Dimension.NUMBER && found == Dimension.RATIO)) {
            throw new UnitException(
                    "'" + whole + "' is " + found.noun() + " but " + expected.noun() + " belongs here",
                    "write " + expected.noun() + " such as '" + example + "'");
        }
        double factor = n.factor() * baseFactor(n.base());
        if (d != null) {
            factor /= d.factor() * baseFactor(d.base());
        }
        return factor;
    }

    private static Unit unit(String s, String whole, Dimension expected, String example) throws UnitException {
        Unit u = unitOrNull(s);
        if (u != null) {
            return u;
        }
        // "10 UV": the prefix letter in the wrong case; SI prefixes stay case-sensitive (m milli, M mega),
        // so the fix names the one reading that exists instead of guessing
        if (!s.isEmpty()) {
            String first = s.substring(0, 1);
            String swapped = first.equals(first.toUpperCase(Locale.ROOT))
                    ? first.toLowerCase(Locale.ROOT)
                    : first.toUpperCase(Locale.ROOT);
            Unit alt = PREFIXES.containsKey(swapped) ? unitOrNull(swapped + s.substring(1)) : null;
            if (alt != null && !swapped.equals(first)) {
                String fixed = whole.replace(s, swapped + s.substring(1));
                throw new UnitException(
                        "'" + first + "' in '" + whole + "' is not an SI prefix",
                        "write '" + fixed + "' (prefixes are case-sensitive: m milli, M mega, k kilo, u micro)");
            }
        }
        throw new UnitException(
                "unit '" + s + "' in '" + whole + "' is not one this tool reads",
                "write " + expected.noun() + " such as '" + example + "'");
    }

    /** A unit symbol, with an optional prefix (case-sensitive) before a base (case-blind where unambiguous), or null. */
    private static Unit unitOrNull(String s) {
        Base exact = base(s);
        if (exact != null) {
            return new Unit(exact, 1.0);
        }
        for (Map.Entry<String, Double> p : PREFIXES.entrySet()) {
            if (s.startsWith(p.getKey()) && s.length() > p.getKey().length()) {
                Base b = base(s.substring(p.getKey().length()));
                if (b != null && prefixable(b)) {
                    return new Unit(b, p.getValue());
                }
            }
        }
        return null;
    }

    /**
     * A base symbol as written, else read case-blind: {@code OHM}, {@code HZ}, {@code DB},
     * {@code v}, {@code a} have one meaning each. Not {@code K}/{@code k} (kelvin against the
     * kilo prefix), {@code S} or {@code H} (siemens and henry are other units), nor the one-letter
     * time units, which stay as listed.
     */
    private static Base base(String s) {
        Base exact = BASES.get(s);
        if (exact != null) {
            return exact;
        }
        return BASES_FOLDED.get(s.toLowerCase(Locale.ROOT));
    }

    private static double baseFactor(Base b) {
        return switch (b) {
            case PERCENT -> 1e-2;
            case PPM -> 1e-6;
            case HOUR -> 3600.0;
            case DAY -> 86400.0;
            case YEAR -> 365.25 * 86400.0;
            case MONTH -> 365.25 * 86400.0 / 12.0;
            default -> 1.0;
        };
    }

    private static Dimension dimensionOf(Base num, Base den) {
        if (den == null) {
            return switch (num) {
                case VOLT -> Dimension.VOLTAGE;
                case AMPERE -> Dimension.CURRENT;
                case OHM -> Dimension.RESISTANCE;
                case FARAD -> Dimension.CAPACITANCE;
                case HERTZ -> Dimension.FREQUENCY;
                case DECIBEL -> Dimension.DECIBEL;
                case CELSIUS, KELVIN -> Dimension.TEMPERATURE;
                case PERCENT, PPM -> Dimension.RATIO;
                case SECOND, HOUR, YEAR, MONTH, DAY -> Dimension.TIME;
                default -> null;
            };
        }
        boolean perDegree = den == Base.CELSIUS || den == Base.KELVIN;
        if (perDegree) {
            return switch (num) {
                case VOLT -> Dimension.VOLTAGE_DRIFT;
                case PERCENT, PPM, NONE -> Dimension.RATIO_DRIFT;
                default -> null;
            };
        }
        if (den == Base.ROOT_HERTZ) {
            return switch (num) {
                case VOLT -> Dimension.VOLTAGE_DENSITY;
                case AMPERE -> Dimension.CURRENT_DENSITY;
                default -> null;
            };
        }
        if (den == Base.WATT && (num == Base.CELSIUS || num == Base.KELVIN)) {
            return Dimension.THERMAL_RESISTANCE;
        }
        if (den == Base.SECOND && num == Base.VOLT) {
            return Dimension.SLEW_RATE;
        }
        return null;
    }

    // ---------------------------------------------------------------- printing

    private static final String[] ENG_PREFIX = {"f", "p", "n", "µ", "m", "", "k", "M", "G", "T"};

    /** Prints with an engineering prefix and 3 significant digits, e.g. {@code 2.50 µV}. */
    public static String format(double si, Dimension d) {
        return format(si, d, 3);
    }

    /** Prints with an engineering prefix and {@code digits} significant digits. */
    public static String format(double si, Dimension d, int digits) {
        if (Double.isNaN(si)) {
            return "n/a";
        }
        if (Double.isInfinite(si)) {
            return (si < 0 ? "-" : "")
                    + INFINITY
                    + switch (d) {
                        case NUMBER -> "";
                        case RATIO -> " %";
                        case RATIO_DRIFT -> " ppm/°C";
                        case RESISTANCE -> " Ω";
                        case SLEW_RATE -> " V/µs";
                        default -> " " + d.symbol();
                    };
        }
        return switch (d) {
            case DECIBEL -> trim(fixed(si, Math.max(0, digits - 3))) + " dB";
            case TEMPERATURE -> trim(fixed(si, 1)) + " °C";
            case RATIO -> ratio(si, digits);
            case RATIO_DRIFT -> trim(sig(si * 1e6, digits)) + " ppm/°C";
            case NUMBER -> trim(sig(si, digits));
            case TIME -> time(si, digits);
            // slew reads in V/µs at every speed (0.5 V/µs ... 2000 V/µs); a prefix there confuses
            // datasheets quote V/µs; a tiny requirement (a slow stage) reads better in V/s or mV/µs
            case SLEW_RATE ->
                Math.abs(si) >= 1e4 || si == 0 ? sig(si * 1e-6, digits) + " V/µs" : engineering(si, digits) + "V/s";
            case RESISTANCE -> engineering(si, digits) + "Ω";
            case THERMAL_RESISTANCE -> trim(sig(si, digits)) + " °C/W"; // no prefix: a few to a few hundred
            default -> engineering(si, digits) + d.symbol();
        };
    }

    /** Number with engineering prefix followed by a space, e.g. {@code "2.50 µ"}. */
    public static String engineering(double si, int digits) {
        if (si == 0.0) {
            return "0 ";
        }
        if (!Double.isFinite(si)) {
            return Double.isNaN(si) ? "n/a " : (si < 0 ? "-" : "") + INFINITY + " ";
        }
        double abs = Math.abs(si);
        int exp3 = (int) Math.floor(Math.log10(abs) / 3.0);
        if (exp3 < -5 || exp3 > 4) {
            return scientific(si, digits) + " "; // beyond f and T a prefix would need a long row of digits
        }
        double scaled = si / Math.pow(10, 3 * exp3);
        // rounding may carry 999.6 up to 1000: move to the next prefix
        String digitsText = sig(scaled, digits);
        if (Math.abs(Double.parseDouble(digitsText)) >= 1000) {
            if (exp3 == 4) {
                return scientific(si, digits) + " ";
            }
            exp3++;
            scaled = si / Math.pow(10, 3 * exp3);
            digitsText = sig(scaled, digits);
        }
        return digitsText + " " + ENG_PREFIX[exp3 + 5];
    }

    /** The sign printed for an infinite value: U+221E INFINITY. */
    public static final String INFINITY = "\u221e";

    /**
     * Magnitudes printed without an exponent where no prefix applies (plain numbers, ratios,
     * years, dB, °C): from 1e-6 to below 1e12; beyond, a row of zeros is harder to read than
     * {@code 1.00e+15}. Prefixed values go to scientific notation beyond f and T.
     */
    private static final double PLAIN_MIN = 1e-6;

    private static final double PLAIN_MAX = 1e12;

    /** {@code 1.00e+30}: {@code digits} significant digits in scientific notation (reads back through parse). */
    private static String scientific(double v, int digits) {
        return String.format(Locale.ROOT, "%." + Math.max(0, digits - 1) + "e", v);
    }

    /**
     * {@code v} rounded to {@code digits} significant digits, printed without exponent inside
     * 1e-6..1e12 (scientific notation outside it; ∞ and n/a for the non-finite). The
     * number of decimals follows the rounded value, so 0.99996 prints "1.00", not "1.000".
     */
    private static String sig(double v, int digits) {
        if (v == 0.0) {
            return "0";
        }
        if (!Double.isFinite(v)) {
            return Double.isNaN(v) ? "n/a" : (v < 0 ? "-" : "") + INFINITY;
        }
        if (Math.abs(v) < PLAIN_MIN || Math.abs(v) >= PLAIN_MAX) {
            return scientific(v, digits);
        }
        BigDecimal r = new BigDecimal(v).round(new MathContext(digits, RoundingMode.HALF_UP));
        int mag = r.precision() - r.scale() - 1; // exponent of the leading digit
        if (mag >= 12) {
            return scientific(v, digits); // 999.96e9 rounded up to 1.00e12
        }
        int decimals = Math.max(0, digits - 1 - mag);
        return r.setScale(decimals, RoundingMode.HALF_UP).toPlainString();
    }

    private static String trim(String s) {
        int e = s.indexOf('e');
        if (e >= 0) {
            return trim(s.substring(0, e)) + s.substring(e); // the mantissa only: 1.50e+30 -> 1.5e+30
        }
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }

    /** {@code v} with {@code decimals} decimals, or in scientific notation beyond the plain range. */
    private static String fixed(double v, int decimals) {
        if (Math.abs(v) >= PLAIN_MAX) {
            return scientific(v, 3);
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    private static String ratio(double si, int digits) {
        double abs = Math.abs(si);
        if (abs != 0 && abs < 1e-3) {
            return trim(sig(si * 1e6, digits)) + " ppm";
        }
        String pct = trim(sig(si * 100, digits));
        // a share below 100 % never reads as 100 % (a yield target of 99.9999 % is not 100 %)
        for (int more = digits + 1; si > 0 && si < 1 && pct.equals("100") && more <= 15; more++) {
            pct = trim(sig(si * 100, more));
        }
        return pct + " %";
    }

    private static String time(double s, int digits) {
        double year = 365.25 * 86400.0;
        if (Math.abs(s) >= year) {
            return trim(sig(s / year, digits)) + " y";
        }
        if (Math.abs(s) >= 3600) {
            return trim(sig(s / 3600, digits)) + " h";
        }
        return engineering(s, digits) + "s";
    }
}
