package org.rosetra.runtime.units;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * Which unit each dimension is shown in. Values stay in SI; only rendering asks here.
 * Strain is dimensionless yet shown as microstrain, so it has its own {@link #strainUnit()}.
 */
public final class DisplayUnits {

    private final Map<Dimension, Unit> units;
    private final Unit strainUnit;

    private DisplayUnits(Map<Dimension, Unit> units, Unit strainUnit) {
        this.units = Collections.unmodifiableMap(new LinkedHashMap<>(units));
        this.strainUnit = strainUnit;
    }

    /** Metric engineering units: MPa, deg, degC, mm, kN, ohm, s, µε. */
    public static DisplayUnits si() {
        Map<Dimension, Unit> units = new LinkedHashMap<>();
        units.put(Dimension.STRESS, Units.MPA);
        units.put(Dimension.ANGLE, Units.DEG);
        units.put(Dimension.TEMPERATURE, Units.DEG_C);
        units.put(Dimension.LENGTH, Units.MILLIMETRE);
        units.put(Dimension.FORCE, Units.KILONEWTON);
        units.put(Dimension.RESISTANCE, Units.OHM);
        units.put(Dimension.TIME, Units.SECOND);
        units.put(Dimension.AREA, Units.MILLIMETRE.pow(2));
        units.put(Dimension.MOMENT, Units.KILONEWTON.times(Units.METRE));
        units.put(Dimension.PER_TEMPERATURE, Units.MICROSTRAIN_GREEK.over(Units.DEG_C));
        return new DisplayUnits(units, Units.MICROSTRAIN_GREEK);
    }

    /** US customary engineering units: ksi, deg, degF, in, kip, ohm, s, µε. */
    public static DisplayUnits us() {
        Map<Dimension, Unit> units = new LinkedHashMap<>();
        units.put(Dimension.STRESS, Units.KSI);
        units.put(Dimension.ANGLE, Units.DEG);
        units.put(Dimension.TEMPERATURE, Units.DEG_F);
        units.put(Dimension.LENGTH, Units.INCH);
        units.put(Dimension.FORCE, Units.KIP);
        units.put(Dimension.RESISTANCE, Units.OHM);
        units.put(Dimension.TIME, Units.SECOND);
        units.put(Dimension.AREA, Units.INCH.pow(2));
        units.put(Dimension.MOMENT, Units.KIP.times(Units.INCH));
        units.put(Dimension.PER_TEMPERATURE, Units.MICROSTRAIN_GREEK.over(Units.DEG_F));
        return new DisplayUnits(units, Units.MICROSTRAIN_GREEK);
    }

    /**
     * The unit to show a value of this dimension in; without a choice, the coherent SI unit
     * labelled with its SI expression (e.g. "kg/m^3"), and a plain number for none.
     */
    public Unit unitFor(Dimension dimension) {
        Unit chosen = units.get(dimension);
        return chosen != null ? chosen : Unit.coherent(dimension);
    }

    /** The unit strains are shown in (dimensionless, e.g. µε). */
    public Unit strainUnit() {
        return strainUnit;
    }

    /** A copy that shows {@code dimension} in {@code unit}. */
    public DisplayUnits with(Dimension dimension, Unit unit) {
        Objects.requireNonNull(unit, "unit");
        if (!unit.dimension().equals(dimension)) {
            throw new DimensionMismatchException("show " + dimension + " in " + unit,
                    dimension, unit.dimension());
        }
        Map<Dimension, Unit> changed = new LinkedHashMap<>(units);
        changed.put(dimension, unit);
        return new DisplayUnits(changed, strainUnit);
    }

    /** A copy that shows strains in {@code unit}, which must be dimensionless (ue, %, ...). */
    public DisplayUnits withStrainUnit(Unit unit) {
        Objects.requireNonNull(unit, "unit");
        if (!unit.dimension().isNone()) {
            throw new DimensionMismatchException("show strain in " + unit, Dimension.NONE, unit.dimension());
        }
        return new DisplayUnits(units, unit);
    }

    /** The explicit choices, in a fixed order. */
    public Map<Dimension, Unit> choices() {
        return units;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof DisplayUnits that && units.equals(that.units) && strainUnit.equals(that.strainUnit);
    }

    @Override
    public int hashCode() {
        return Objects.hash(units, strainUnit);
    }

    @Override
    public String toString() {
        return "DisplayUnits" + units + ", strain in " + strainUnit;
    }
}
