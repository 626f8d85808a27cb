package dev.ampsieve.stage;

/**
 * Whether the maker may calibrate each unit, how, to what resolution (output-referred
 * volts) and at what cost per unit (labour, a trimmer or DAC, test time).
 */
public record Trim(boolean allowed, Method method, double resolution, double cost) {

    public enum Method { ONE_POINT, TWO_POINT }

    public static final Trim NONE = new Trim(false, Method.ONE_POINT, 0, 0);
}
