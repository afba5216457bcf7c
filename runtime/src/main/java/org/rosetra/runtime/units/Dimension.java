package org.rosetra.runtime.units;

import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.IntFunction;

/**
 * A physical dimension: exact rational exponents over the {@link BaseDimension}s.
 * Immutable; equal dimensions are equal objects. Strain, {@code %} and microstrain are
 * {@link #NONE}.
 */
public final class Dimension {

    private static final BaseDimension[] BASES = BaseDimension.values();

    public static final Dimension NONE = new Dimension(new Rational[BASES.length]);
    public static final Dimension MASS = of(BaseDimension.MASS);
    public static final Dimension LENGTH = of(BaseDimension.LENGTH);
    public static final Dimension TIME = of(BaseDimension.TIME);
    public static final Dimension CURRENT = of(BaseDimension.CURRENT);
    public static final Dimension TEMPERATURE = of(BaseDimension.TEMPERATURE);
    public static final Dimension ANGLE = of(BaseDimension.ANGLE);

    public static final Dimension AREA = LENGTH.pow(2);
    public static final Dimension VOLUME = LENGTH.pow(3);
    public static final Dimension FREQUENCY = NONE.over(TIME);
    public static final Dimension VELOCITY = LENGTH.over(TIME);
    public static final Dimension ACCELERATION = VELOCITY.over(TIME);
    public static final Dimension ANGULAR_VELOCITY = ANGLE.over(TIME);
    public static final Dimension FORCE = MASS.times(ACCELERATION);
    public static final Dimension STRESS = FORCE.over(AREA);
    /** Force times length: bending moment and torque (and, dimensionally, energy). */
    public static final Dimension MOMENT = FORCE.times(LENGTH);
    public static final Dimension FORCE_PER_LENGTH = FORCE.over(LENGTH);
    public static final Dimension POWER = MOMENT.over(TIME);
    public static final Dimension VOLTAGE = POWER.over(CURRENT);
    public static final Dimension RESISTANCE = VOLTAGE.over(CURRENT);
    public static final Dimension DENSITY = MASS.over(VOLUME);
    /** E.g. a coefficient of thermal expansion, or microstrain per degC. */
    public static final Dimension PER_TEMPERATURE = NONE.over(TEMPERATURE);
    public static final Dimension STRESS_PER_TEMPERATURE = STRESS.over(TEMPERATURE);

    /** Stable names: they appear in results.json, so change none of them. */
    private static final Map<Dimension, String> NAMES = names();
    private static final Map<String, Dimension> BY_NAME = invert(NAMES);

    private final Rational[] exponents;

    private Dimension(Rational[] exponents) {
        this.exponents = exponents.clone();
        for (int i = 0; i < this.exponents.length; i++) {
            if (this.exponents[i] == null) {
                this.exponents[i] = Rational.ZERO;
            }
        }
    }

    /** The dimension of one base, e.g. {@code of(BaseDimension.LENGTH)} is length. */
    public static Dimension of(BaseDimension base) {
        Rational[] exponents = new Rational[BASES.length];
        exponents[base.ordinal()] = Rational.ONE;
        return new Dimension(exponents);
    }

    /** The dimension with this stable name ("stress", "angle", ...), if there is one. */
    public static Optional<Dimension> named(String name) {
        return Optional.ofNullable(BY_NAME.get(name));
    }

    /** Every named dimension with its stable name, in a fixed order. */
    public static Map<String, Dimension> namedDimensions() {
        return BY_NAME;
    }

    public Rational exponent(BaseDimension base) {
        return exponents[base.ordinal()];
    }

    public Dimension times(Dimension other) {
        return combine(i -> exponents[i].plus(other.exponents[i]));
    }

    public Dimension over(Dimension other) {
        return combine(i -> exponents[i].minus(other.exponents[i]));
    }

    public Dimension pow(Rational power) {
        return combine(i -> exponents[i].times(power));
    }

    public Dimension pow(int power) {
        return pow(Rational.of(power));
    }

    public Dimension sqrt() {
        return pow(Rational.HALF);
    }

    public boolean isNone() {
        return Arrays.stream(exponents).allMatch(Rational::isZero);
    }

    /** The stable name of a known dimension, else its canonical SI expression ("kg*m^4/s^2"). */
    public String name() {
        String known = NAMES.get(this);
        return known != null ? known : siExpression();
    }

    /**
     * The SI expression of the coherent unit, e.g. "kg/m/s^2" for stress, "1" for none.
     * It reads back through {@link UnitParser} to a unit of scale 1.
     */
    public String siExpression() {
        return expression(BaseDimension::siSymbol);
    }

    /** For messages: the stable name of a known dimension, else "length^4", "1/time". */
    @Override
    public String toString() {
        String known = NAMES.get(this);
        return known != null ? known : expression(BaseDimension::word);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof Dimension that && Arrays.equals(exponents, that.exponents);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(exponents);
    }

    private Dimension combine(IntFunction<Rational> exponentOf) {
        Rational[] result = new Rational[BASES.length];
        for (int i = 0; i < result.length; i++) {
            result[i] = exponentOf.apply(i);
        }
        return new Dimension(result);
    }

    /** Positive powers joined by '*', then each negative power after a '/'. */
    private String expression(Function<BaseDimension, String> label) {
        StringBuilder numerator = new StringBuilder();
        StringBuilder denominator = new StringBuilder();
        for (BaseDimension base : BASES) {
            Rational power = exponents[base.ordinal()];
            if (power.signum() > 0) {
                if (numerator.length() > 0) {
                    numerator.append('*');
                }
                numerator.append(label.apply(base)).append(powerSuffix(power));
            } else if (power.signum() < 0) {
                denominator.append('/').append(label.apply(base)).append(powerSuffix(power.negate()));
            }
        }
        return (numerator.length() == 0 ? "1" : numerator.toString()) + denominator;
    }

    private static String powerSuffix(Rational power) {
        if (power.equals(Rational.ONE)) {
            return "";
        }
        return power.isInteger() ? "^" + power : "^(" + power + ")";
    }

    private static Map<Dimension, String> names() {
        Map<Dimension, String> names = new LinkedHashMap<>();
        names.put(NONE, "none");
        names.put(LENGTH, "length");
        names.put(MASS, "mass");
        names.put(TIME, "time");
        names.put(TEMPERATURE, "temperature");
        names.put(CURRENT, "current");
        names.put(ANGLE, "angle");
        names.put(AREA, "area");
        names.put(VOLUME, "volume");
        names.put(FREQUENCY, "frequency");
        names.put(VELOCITY, "velocity");
        names.put(ACCELERATION, "acceleration");
        names.put(ANGULAR_VELOCITY, "angular_velocity");
        names.put(FORCE, "force");
        names.put(STRESS, "stress");
        names.put(MOMENT, "moment");
        names.put(FORCE_PER_LENGTH, "force_per_length");
        names.put(POWER, "power");
        names.put(VOLTAGE, "voltage");
        names.put(RESISTANCE, "resistance");
        names.put(DENSITY, "density");
        names.put(PER_TEMPERATURE, "per_temperature");
        names.put(STRESS_PER_TEMPERATURE, "stress_per_temperature");
        return Collections.unmodifiableMap(names);
    }

    private static Map<String, Dimension> invert(Map<Dimension, String> names) {
        Map<String, Dimension> byName = new LinkedHashMap<>();
        names.forEach((dimension, name) -> byName.put(name, dimension));
        return Collections.unmodifiableMap(byName);
    }
}
