package org.rosetra.runtime.gauge;

import java.util.OptionalDouble;

/**
 * Steps 1 and 2 of LANGUAGE.md, "What happens to one reading, in order", for one arm:
 * gauge factor, quarter-bridge non-linearity and lead wires, then the thermal output.
 * Built once per arm; every constant that does not depend on the reading is folded here.
 */
public final class ArmCorrection {

    /** Below absolute zero a temperature is a typing or unit mistake. */
    private static final double ABSOLUTE_ZERO_C = -273.15;

    private final Gauge gauge;
    private final Bridge bridge;
    private final double leadOhm;
    private final double instrumentFactor;

    /** Bridge none: e = e_ind * noneScale. */
    private final double noneScale;
    /** Quarter bridge: Vr = vrScale * e_ind. */
    private final double vrScale;
    /** Quarter bridge: e = quarterScale * Vr / (1 - 2 Vr). */
    private final double quarterScale;
    /** Thermal polynomial already multiplied by thermal_factor / F. */
    private final double[] thermalAtFactor;

    public ArmCorrection(Gauge gauge, Bridge bridge, double leadOhm, double instrumentFactor) {
        if (gauge == null) {
            throw new GaugeException("gauge must be given; declare the gauge the arm is made of");
        }
        if (bridge == null) {
            throw new GaugeException("bridge must be given; use none when the instrument reads strain directly");
        }
        if (!(leadOhm >= 0) || !Double.isFinite(leadOhm)) {
            throw new GaugeException("lead resistance must be a finite number of ohm, 0 or more, got " + leadOhm
                    + "; give the resistance of one lead wire");
        }
        if (bridge == Bridge.NONE && leadOhm != 0) {
            throw new GaugeException("lead resistance " + leadOhm + " ohm was given with bridge none, where"
                    + " it would not be applied; set bridge to quarter or quarter_3wire, or leave lead out");
        }
        if (!(instrumentFactor > 0) || !Double.isFinite(instrumentFactor)) {
            throw new GaugeException("instrument factor must be a positive finite number, got " + instrumentFactor
                    + "; give the gauge factor set on the instrument, or leave it out to use the gauge's");
        }
        this.gauge = gauge;
        this.bridge = bridge;
        this.leadOhm = leadOhm;
        this.instrumentFactor = instrumentFactor;
        double f = gauge.factor();
        this.noneScale = instrumentFactor / f;
        this.vrScale = instrumentFactor / 4.0;
        this.quarterScale = 4.0 * (1.0 + bridge.leadsInGaugeArm() * leadOhm / gauge.resistance()) / f;
        double[] a = gauge.thermal();
        double k = gauge.thermalFactor() / f;
        for (int i = 0; i < a.length; i++) {
            a[i] *= k;
        }
        this.thermalAtFactor = a;
    }

    /** An arm whose instrument is set to the gauge's own factor. */
    public static ArmCorrection atGaugeFactor(Gauge gauge, Bridge bridge, double leadOhm) {
        if (gauge == null) {
            throw new GaugeException("gauge must be given; declare the gauge the arm is made of");
        }
        return new ArmCorrection(gauge, bridge, leadOhm, gauge.factor());
    }

    public Gauge gauge() {
        return gauge;
    }

    public Bridge bridge() {
        return bridge;
    }

    public double leadOhm() {
        return leadOhm;
    }

    public double instrumentFactor() {
        return instrumentFactor;
    }

    /** True when a temperature changes the result (the gauge has a thermal polynomial). */
    public boolean usesTemperature() {
        return thermalAtFactor.length > 0;
    }

    /** Step 1 only, no temperature. */
    public double correct(double indicated) {
        requireFiniteReading(indicated, -1);
        return afterBridge(indicated, -1);
    }

    /** Steps 1 and 2; the temperature is in degC. */
    public double correct(double indicated, double temperatureC) {
        requireFiniteReading(indicated, -1);
        requireTemperature(temperatureC, -1);
        return afterBridge(indicated, -1) - thermalOutput(temperatureC);
    }

    /**
     * Steps 1 and 2 over a column: {@code out[i]} for {@code in[i]} and, when the column is
     * given, {@code temperatureCOrNull[i]} in degC. Allocates nothing; {@code out} may be {@code in}.
     */
    public void correct(double[] in, double[] temperatureCOrNull, double[] out, int n) {
        correct(in, temperatureCOrNull, 0.0, out, n);
    }

    /**
     * Steps 1 to 3 over a column: as {@link #correct(double[], double[], double[], int)}, less
     * {@code correctedZero}, this arm's zero reading already corrected by steps 1 and 2 (a
     * baseline's, or the mean over a zero window). One pass; allocates nothing.
     */
    public void correct(double[] in, double[] temperatureCOrNull, double correctedZero, double[] out, int n) {
        requireColumns(in, temperatureCOrNull, out, n);
        if (!Double.isFinite(correctedZero)) {
            throw new GaugeException("corrected zero reading must be a finite strain, got " + correctedZero
                    + "; check the baseline or the zero window of this arm");
        }
        final boolean thermal = temperatureCOrNull != null && thermalAtFactor.length > 0;
        if (temperatureCOrNull != null && !thermal) {
            // No polynomial: the temperature changes nothing, but a bad one is still a bad input.
            for (int i = 0; i < n; i++) {
                double t = temperatureCOrNull[i];
                if (!(t >= ABSOLUTE_ZERO_C) || !(t <= Double.MAX_VALUE)) {
                    requireTemperature(t, i);
                }
            }
        }
        final double z = correctedZero;
        final double[] a = thermalAtFactor;
        final int last = a.length - 1;
        if (bridge == Bridge.NONE) {
            final double s = noneScale;
            for (int i = 0; i < n; i++) {
                double x = in[i];
                if (!(Math.abs(x) <= Double.MAX_VALUE)) {
                    requireFiniteReading(x, i);
                }
                double e = x * s;
                if (thermal) {
                    e -= thermalAt(a, last, temperatureCOrNull[i], i);
                }
                out[i] = e - z; // same order as the scalar path: corrected, then less the zero
            }
        } else {
            final double v = vrScale;
            final double q = quarterScale;
            for (int i = 0; i < n; i++) {
                double x = in[i];
                double vr = v * x;
                // One test catches NaN, infinity and a bridge output outside (-0.5, 0.5).
                if (!(vr < 0.5 && vr > -0.5)) {
                    requireFiniteReading(x, i);
                    requirePhysicalBridge(vr, x, i);
                }
                double e = q * vr / (1.0 - 2.0 * vr);
                if (thermal) {
                    e -= thermalAt(a, last, temperatureCOrNull[i], i);
                }
                out[i] = e - z; // same order as the scalar path: corrected, then less the zero
            }
        }
    }

    /** TO(t) at the gauge's factor, Horner; checks the temperature of sample i. */
    private static double thermalAt(double[] a, int last, double t, int i) {
        if (!(t >= ABSOLUTE_ZERO_C) || !(t <= Double.MAX_VALUE)) {
            requireTemperature(t, i);
        }
        double to = a[last];
        for (int k = last - 1; k >= 0; k--) {
            to = to * t + a[k];
        }
        return to;
    }

    /** Steps 1 and 2 with each value kept for the calculation record. */
    public CorrectionTrace trace(double indicated, Double temperatureCOrNull) {
        requireFiniteReading(indicated, -1);
        double after = afterBridge(indicated, -1);
        if (temperatureCOrNull == null) {
            return new CorrectionTrace(indicated, bridge, after, OptionalDouble.empty(), 0.0, after,
                    OptionalDouble.empty(), after);
        }
        double t = temperatureCOrNull;
        requireTemperature(t, -1);
        double to = thermalOutput(t);
        double corrected = after - to;
        return new CorrectionTrace(indicated, bridge, after, OptionalDouble.of(t), to, corrected,
                OptionalDouble.empty(), corrected);
    }

    /** The thermal output removed at this temperature (degC), at the gauge's factor. */
    public double thermalOutput(double temperatureC) {
        double[] a = thermalAtFactor;
        double sum = 0;
        for (int k = a.length - 1; k >= 0; k--) {
            sum = sum * temperatureC + a[k];
        }
        return sum;
    }

    private double afterBridge(double indicated, int index) {
        if (bridge == Bridge.NONE) {
            return indicated * noneScale;
        }
        double vr = vrScale * indicated;
        requirePhysicalBridge(vr, indicated, index);
        return quarterScale * vr / (1.0 - 2.0 * vr);
    }

    private static void requireFiniteReading(double indicated, int index) {
        if (!Double.isFinite(indicated)) {
            throw new GaugeException("reading" + at(index) + " must be a finite strain, got " + indicated
                    + "; check the instrument's record for a missing or overflowed value");
        }
    }

    private void requirePhysicalBridge(double vr, double indicated, int index) {
        // A quarter bridge's output lies in (-0.5, 0.5): at +0.5 the gauge's resistance would be
        // infinite, at -0.5 zero.
        if (!(vr < 0.5 && vr > -0.5)) {
            throw new GaugeException("reading" + at(index) + " of " + indicated + " means a bridge output Vr = "
                    + vr + " (instrument factor " + instrumentFactor + " times reading over 4), outside"
                    + " (-0.5, 0.5) and not physical for a quarter bridge; check the reading's unit"
                    + " (ue is 1e-6) and the instrument factor");
        }
    }

    private static void requireTemperature(double temperatureC, int index) {
        if (!Double.isFinite(temperatureC)) {
            throw new GaugeException("temperature" + at(index) + " must be a finite number of degC, got "
                    + temperatureC + "; check the temperature record for a missing value");
        }
        if (temperatureC < ABSOLUTE_ZERO_C) {
            throw new GaugeException("temperature" + at(index) + " of " + temperatureC + " degC is below absolute"
                    + " zero; the thermal-output polynomial takes degC: convert K or degF first");
        }
    }

    private static void requireColumns(double[] in, double[] temperature, double[] out, int n) {
        if (in == null || out == null) {
            throw new GaugeException("reading and output columns must be given");
        }
        if (n < 0 || n > in.length || n > out.length || (temperature != null && n > temperature.length)) {
            throw new GaugeException("sample count " + n + " does not fit the columns (readings " + in.length
                    + ", output " + out.length + (temperature != null ? ", temperature " + temperature.length : "")
                    + "); pass a count no larger than the shortest column");
        }
    }

    private static String at(int index) {
        return index < 0 ? "" : " at sample " + index;
    }
}
