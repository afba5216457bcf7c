package org.rosetra.runtime.units;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The table of named units. Every factor is exact by definition or taken from
 * NIST SP 811 (2008), Appendix B; the tests check each one against that source.
 */
public final class Units {

    private static final double POUND_FORCE_N = 4.4482216152605; // exact: 0.45359237 kg * 9.80665 m/s^2
    private static final double INCH_M = 0.0254;                  // exact by definition
    private static final double PSI_PA = POUND_FORCE_N / (INCH_M * INCH_M);

    // dimensionless
    public static final Unit PERCENT = Unit.linear("%", Dimension.NONE, 0.01);
    public static final Unit MICROSTRAIN = Unit.linear("ue", Dimension.NONE, 1e-6);
    /** µε written with the Greek small letter mu, U+03BC. */
    public static final Unit MICROSTRAIN_GREEK = Unit.linear("\u03BC\u03B5", Dimension.NONE, 1e-6);
    /** µε written with the micro sign, U+00B5, which many keyboards produce. */
    public static final Unit MICROSTRAIN_MICRO_SIGN = Unit.linear("\u00B5\u03B5", Dimension.NONE, 1e-6);

    // stress
    public static final Unit PA = Unit.linear("Pa", Dimension.STRESS, 1.0);
    public static final Unit KPA = Unit.linear("kPa", Dimension.STRESS, 1e3);
    public static final Unit MPA = Unit.linear("MPa", Dimension.STRESS, 1e6);
    public static final Unit GPA = Unit.linear("GPa", Dimension.STRESS, 1e9);
    public static final Unit BAR = Unit.linear("bar", Dimension.STRESS, 1e5);
    public static final Unit PSI = Unit.linear("psi", Dimension.STRESS, PSI_PA);
    public static final Unit KSI = Unit.linear("ksi", Dimension.STRESS, 1e3 * PSI_PA);
    public static final Unit MSI = Unit.linear("Msi", Dimension.STRESS, 1e6 * PSI_PA);

    // angle
    public static final Unit RAD = Unit.linear("rad", Dimension.ANGLE, 1.0);
    public static final Unit DEG = Unit.linear("deg", Dimension.ANGLE, Math.PI / 180.0);

    // temperature: a bare symbol is an absolute temperature
    public static final Unit KELVIN = Unit.linear("K", Dimension.TEMPERATURE, 1.0);
    public static final Unit DEG_C = new Unit("degC", Dimension.TEMPERATURE, 1.0, 273.15);
    public static final Unit DEG_F = new Unit("degF", Dimension.TEMPERATURE, 1.0 / 1.8, 459.67);

    // electrical
    public static final Unit OHM = Unit.linear("ohm", Dimension.RESISTANCE, 1.0);
    /** Ω written with the Greek capital omega, U+03A9. */
    public static final Unit OHM_GREEK = Unit.linear("\u03A9", Dimension.RESISTANCE, 1.0);
    public static final Unit KILOOHM = Unit.linear("kohm", Dimension.RESISTANCE, 1e3);
    public static final Unit AMPERE = Unit.linear("A", Dimension.CURRENT, 1.0);
    public static final Unit MILLIAMPERE = Unit.linear("mA", Dimension.CURRENT, 1e-3);
    public static final Unit VOLT = Unit.linear("V", Dimension.VOLTAGE, 1.0);
    public static final Unit MILLIVOLT = Unit.linear("mV", Dimension.VOLTAGE, 1e-3);

    // length
    public static final Unit METRE = Unit.linear("m", Dimension.LENGTH, 1.0);
    public static final Unit CENTIMETRE = Unit.linear("cm", Dimension.LENGTH, 1e-2);
    public static final Unit MILLIMETRE = Unit.linear("mm", Dimension.LENGTH, 1e-3);
    public static final Unit MICROMETRE = Unit.linear("um", Dimension.LENGTH, 1e-6);
    public static final Unit INCH = Unit.linear("in", Dimension.LENGTH, INCH_M);
    public static final Unit FOOT = Unit.linear("ft", Dimension.LENGTH, 0.3048);

    // mass
    public static final Unit KILOGRAM = Unit.linear("kg", Dimension.MASS, 1.0);

    // force
    public static final Unit NEWTON = Unit.linear("N", Dimension.FORCE, 1.0);
    public static final Unit KILONEWTON = Unit.linear("kN", Dimension.FORCE, 1e3);
    public static final Unit MEGANEWTON = Unit.linear("MN", Dimension.FORCE, 1e6);
    public static final Unit POUND_FORCE = Unit.linear("lbf", Dimension.FORCE, POUND_FORCE_N);
    public static final Unit KIP = Unit.linear("kip", Dimension.FORCE, 1e3 * POUND_FORCE_N);

    // time
    public static final Unit SECOND = Unit.linear("s", Dimension.TIME, 1.0);
    public static final Unit MILLISECOND = Unit.linear("ms", Dimension.TIME, 1e-3);
    public static final Unit MINUTE = Unit.linear("min", Dimension.TIME, 60.0);
    public static final Unit HOUR = Unit.linear("h", Dimension.TIME, 3600.0);
    public static final Unit HERTZ = Unit.linear("Hz", Dimension.FREQUENCY, 1.0);

    private static final Map<String, Unit> BY_SYMBOL = table(
            PERCENT, MICROSTRAIN, MICROSTRAIN_GREEK, MICROSTRAIN_MICRO_SIGN,
            PA, KPA, MPA, GPA, BAR, PSI, KSI, MSI,
            RAD, DEG,
            KELVIN, DEG_C, DEG_F,
            OHM, OHM_GREEK, KILOOHM, AMPERE, MILLIAMPERE, VOLT, MILLIVOLT,
            METRE, CENTIMETRE, MILLIMETRE, MICROMETRE, INCH, FOOT,
            KILOGRAM,
            NEWTON, KILONEWTON, MEGANEWTON, POUND_FORCE, KIP,
            SECOND, MILLISECOND, MINUTE, HOUR, HERTZ);

    private static final List<String> SYMBOLS = sortedSymbols();

    private Units() {
    }

    /** The named unit with exactly this symbol (case matters: "MPa", not "mpa"). */
    public static Optional<Unit> find(String symbol) {
        return Optional.ofNullable(BY_SYMBOL.get(symbol));
    }

    /** Every symbol, sorted, for completion and suggestions. */
    public static List<String> symbols() {
        return SYMBOLS;
    }

    private static Map<String, Unit> table(Unit... units) {
        Map<String, Unit> bySymbol = new LinkedHashMap<>();
        for (Unit unit : units) {
            if (bySymbol.put(unit.symbol(), unit) != null) {
                throw new IllegalStateException("unit symbol '" + unit.symbol() + "' is defined twice");
            }
        }
        return Collections.unmodifiableMap(bySymbol);
    }

    private static List<String> sortedSymbols() {
        List<String> symbols = new ArrayList<>(BY_SYMBOL.keySet());
        Collections.sort(symbols);
        return List.copyOf(symbols);
    }
}
