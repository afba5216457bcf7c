package org.rosetra.runtime.gauge;

import java.util.Arrays;

/**
 * One kind of strain gauge, as its data sheet describes it.
 *
 * @param factor        gauge factor F, &gt; 0
 * @param transverse    transverse sensitivity coefficient Kt, as a fraction
 * @param nu0           Poisson's ratio of the beam on which F and Kt were measured
 * @param resistance    gauge resistance in ohm
 * @param thermal       a0..an of the thermal-output polynomial in the temperature in degC,
 *                      as apparent strain (a fraction); empty when the gauge has none
 * @param thermalFactor the gauge factor at which that polynomial was recorded
 */
public record Gauge(double factor, double transverse, double nu0, double resistance,
                    double[] thermal, double thermalFactor) {

    public static final double DEFAULT_NU0 = 0.285;
    public static final double DEFAULT_RESISTANCE_OHM = 120.0;
    public static final double DEFAULT_THERMAL_FACTOR = 2.00;
    /** Largest transverse sensitivity accepted, as a fraction (20 %). */
    public static final double MAX_TRANSVERSE = 0.2;

    public Gauge {
        if (!(factor > 0) || !Double.isFinite(factor)) {
            throw new GaugeException("gauge factor must be a positive finite number, got " + factor
                    + "; give the factor from the gauge's data sheet (typically about 2)");
        }
        // Data sheets give a few percent at most; a larger value is almost always a percentage
        // typed as a fraction (0.6 for 0.6 %), which would silently skew every strain.
        if (!(Math.abs(transverse) <= MAX_TRANSVERSE)) {
            throw new GaugeException("transverse sensitivity must be a fraction within +-" + MAX_TRANSVERSE
                    + ", got " + transverse + "; give it in % or as a fraction, e.g. 0.6 % (0.006)");
        }
        if (!(nu0 > -1 && nu0 < 0.5)) {
            throw new GaugeException("nu0 (Poisson's ratio of the calibration beam) must lie in (-1, 0.5), got "
                    + nu0 + "; leave it out to use " + DEFAULT_NU0);
        }
        if (!(resistance > 0) || !Double.isFinite(resistance)) {
            throw new GaugeException("gauge resistance must be a positive finite number of ohm, got "
                    + resistance + "; typical values are 120, 350 or 1000 ohm");
        }
        if (thermal == null) {
            throw new GaugeException("thermal coefficients must not be null; give an empty list when the gauge has none");
        }
        thermal = thermal.clone();
        for (int i = 0; i < thermal.length; i++) {
            if (!Double.isFinite(thermal[i])) {
                throw new GaugeException("thermal coefficient a" + i + " must be a finite number, got "
                        + thermal[i] + "; check the thermal-output polynomial on the gauge's data sheet");
            }
        }
        if (!(thermalFactor > 0) || !Double.isFinite(thermalFactor)) {
            throw new GaugeException("thermal factor must be a positive finite number, got " + thermalFactor
                    + "; give the gauge factor at which the thermal output was recorded (often 2.00)");
        }
    }

    /** A gauge of the given factor with every other field at its default. */
    public static Gauge withFactor(double factor) {
        return new Gauge(factor, 0.0, DEFAULT_NU0, DEFAULT_RESISTANCE_OHM, new double[0], DEFAULT_THERMAL_FACTOR);
    }

    public Gauge withTransverse(double kt) {
        return new Gauge(factor, kt, nu0, resistance, thermal, thermalFactor);
    }

    public Gauge withNu0(double value) {
        return new Gauge(factor, transverse, value, resistance, thermal, thermalFactor);
    }

    public Gauge withResistance(double ohm) {
        return new Gauge(factor, transverse, nu0, ohm, thermal, thermalFactor);
    }

    public Gauge withThermal(double... coefficients) {
        return new Gauge(factor, transverse, nu0, resistance, coefficients, thermalFactor);
    }

    public Gauge withThermalFactor(double value) {
        return new Gauge(factor, transverse, nu0, resistance, thermal, value);
    }

    /** A copy, so the record stays immutable. */
    @Override
    public double[] thermal() {
        return thermal.clone();
    }

    public boolean hasThermal() {
        return thermal.length > 0;
    }

    /** TO(T) = a0 + a1 T + a2 T^2 + ..., T in degC, as apparent strain at the thermal factor. */
    public double thermalOutput(double temperatureC) {
        double sum = 0;
        for (int i = thermal.length - 1; i >= 0; i--) {
            sum = sum * temperatureC + thermal[i];
        }
        return sum;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Gauge g
                && Double.compare(factor, g.factor) == 0
                && Double.compare(transverse, g.transverse) == 0
                && Double.compare(nu0, g.nu0) == 0
                && Double.compare(resistance, g.resistance) == 0
                && Arrays.equals(thermal, g.thermal)
                && Double.compare(thermalFactor, g.thermalFactor) == 0;
    }

    @Override
    public int hashCode() {
        int h = Double.hashCode(factor);
        h = 31 * h + Double.hashCode(transverse);
        h = 31 * h + Double.hashCode(nu0);
        h = 31 * h + Double.hashCode(resistance);
        h = 31 * h + Arrays.hashCode(thermal);
        return 31 * h + Double.hashCode(thermalFactor);
    }

    @Override
    public String toString() {
        return "Gauge[factor=" + factor + ", transverse=" + transverse + ", nu0=" + nu0
                + ", resistance=" + resistance + ", thermal=" + Arrays.toString(thermal)
                + ", thermalFactor=" + thermalFactor + "]";
    }
}
