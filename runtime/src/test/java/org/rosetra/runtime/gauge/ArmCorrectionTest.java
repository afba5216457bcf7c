package org.rosetra.runtime.gauge;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ArmCorrectionTest {

    private static final double UE = 1e-6;

    /**
     * What an instrument set to {@code instrumentFactor} indicates for a quarter-bridge gauge
     * at true strain {@code strain}. Wheatstone bridge with one active arm of equal arms:
     * Vr = x/4 / (1 + x/2) with x = dR/R (common practice; Hoffmann, An Introduction to
     * Measurements using Strain Gages, the quarter bridge, from memory). Lead wires in series
     * with the gauge scale x by the desensitization R_g / (R_g + n R_L), n = 1 three-wire,
     * n = 2 two-wire (from memory).
     */
    private static double quarterBridgeIndication(double strain, double gaugeFactor, double gaugeOhm,
                                                  int leadsInArm, double leadOhm, double instrumentFactor) {
        double desensitization = gaugeOhm / (gaugeOhm + leadsInArm * leadOhm);
        double x = gaugeFactor * strain * desensitization;
        double vr = x / 4 / (1 + x / 2);
        return 4 * vr / instrumentFactor;
    }

    @Test
    void bridgeNoneUndoesTheInstrumentFactor() {
        // Common practice: an indication taken at factor F_inst scales by F_inst / F.
        ArmCorrection arm = new ArmCorrection(Gauge.withFactor(2.09), Bridge.NONE, 0, 2.00);
        assertEquals(1000 * UE * 2.00 / 2.09, arm.correct(1000 * UE), 1e-18);
    }

    @ParameterizedTest
    @CsvSource({
            // strain ue, F, R_g ohm, bridge, lead ohm, F_inst
            "1000, 2.00, 120, QUARTER, 0.0, 2.00",
            "-2500, 2.09, 350, QUARTER_3WIRE, 0.8, 2.00",
            "5000, 2.09, 120, QUARTER, 1.5, 2.09",
            "20000, 2.15, 350, QUARTER_3WIRE, 3.2, 2.00",
            "-20000, 2.00, 1000, QUARTER, 4.0, 2.10",
    })
    void quarterBridgeGivesBackTheTrueStrain(double strainUe, double factor, double ohm, Bridge bridge,
                                             double leadOhm, double instrumentFactor) {
        double strain = strainUe * UE;
        double indicated = quarterBridgeIndication(strain, factor, ohm, bridge.leadsInGaugeArm(), leadOhm,
                instrumentFactor);
        ArmCorrection arm = new ArmCorrection(Gauge.withFactor(factor).withResistance(ohm), bridge, leadOhm,
                instrumentFactor);
        // Wheatstone bridge and lead-wire desensitization, forward above (common practice, from memory).
        assertEquals(strain, arm.correct(indicated), 1e-15);
    }

    @Test
    void quarterBridgeNonLinearityIsAboutATenthPercentPerThousandMicrostrain() {
        // Common practice (from memory): at F = 2 a quarter bridge reads low by about F e / 2,
        // 0.1 % at 1000 ue; exactly, the indication is e / (1 + F e / 2) = 999.000999 ue.
        double indicated = quarterBridgeIndication(1000 * UE, 2.0, 120, 2, 0, 2.0);
        assertEquals(1000 * UE / 1.001, indicated, 1e-18);
        ArmCorrection arm = ArmCorrection.atGaugeFactor(Gauge.withFactor(2.0), Bridge.QUARTER, 0);
        assertEquals(1000 * UE, arm.correct(indicated), 1e-18);
    }

    @Test
    void leadWiresDesensitizeByGaugeOverGaugePlusLeads() {
        // From memory: two-wire quarter bridge, R_g = 120 ohm, 2 x 0.6 ohm leads: an indication
        // is low by R_g / (R_g + 2 R_L) = 120 / 121.2, before the (tiny) non-linearity.
        ArmCorrection twoWire = ArmCorrection.atGaugeFactor(Gauge.withFactor(2.0), Bridge.QUARTER, 0.6);
        ArmCorrection noLead = ArmCorrection.atGaugeFactor(Gauge.withFactor(2.0), Bridge.QUARTER, 0.0);
        double indicated = 10 * UE;
        assertEquals(121.2 / 120, twoWire.correct(indicated) / noLead.correct(indicated), 1e-12);
        // Three-wire: one lead in the gauge arm, 120.6 / 120.
        ArmCorrection threeWire = ArmCorrection.atGaugeFactor(Gauge.withFactor(2.0), Bridge.QUARTER_3WIRE, 0.6);
        assertEquals(120.6 / 120, threeWire.correct(indicated) / noLead.correct(indicated), 1e-12);
    }

    @Test
    void thermalOutputIsRemovedAtTheActualGaugeFactor() {
        Gauge gauge = Gauge.withFactor(2.09).withThermal(-21.5 * UE, 2.10 * UE, -0.0430 * UE, 0.000155 * UE, 0)
                .withThermalFactor(2.00);
        // By hand: TO(50 degC) = -21.5 + 2.10*50 - 0.0430*2500 + 0.000155*125000 = -4.625 ue.
        assertEquals(-4.625 * UE, gauge.thermalOutput(50), 1e-15);
        ArmCorrection arm = ArmCorrection.atGaugeFactor(gauge, Bridge.NONE, 0);
        // Common practice: a curve recorded at F* reads TO * F* / F on an instrument set to F.
        assertEquals(-4.625 * UE * 2.00 / 2.09, arm.thermalOutput(50), 1e-15);
        // A free (unstrained) gauge at 50 degC indicates only its thermal output: corrected to zero.
        assertEquals(0.0, arm.correct(-4.625 * UE * 2.00 / 2.09, 50), 1e-18);
        // A strained gauge keeps its mechanical strain.
        assertEquals(300 * UE, arm.correct(300 * UE - 4.625 * UE * 2.00 / 2.09, 50), 1e-15);
    }

    @Test
    void temperatureIsIgnoredWithoutAThermalPolynomial() {
        ArmCorrection arm = ArmCorrection.atGaugeFactor(Gauge.withFactor(2.1), Bridge.NONE, 0);
        assertFalse(arm.usesTemperature());
        assertEquals(arm.correct(250 * UE), arm.correct(250 * UE, 80), 0);
    }

    @Test
    void columnsAgreeWithTheScalarPath() {
        Gauge gauge = Gauge.withFactor(2.09).withResistance(350)
                .withThermal(-21.5 * UE, 2.10 * UE, -0.0430 * UE, 0.000155 * UE);
        for (Bridge bridge : Bridge.values()) {
            double lead = bridge == Bridge.NONE ? 0 : 0.8;
            ArmCorrection arm = new ArmCorrection(gauge, bridge, lead, 2.00);
            int n = 1000;
            double[] in = new double[n];
            double[] temp = new double[n];
            for (int i = 0; i < n; i++) {
                in[i] = (i - 500) * 7.3 * UE;
                temp[i] = -20 + 0.11 * i;
            }
            double[] out = new double[n];
            double[] outNoTemp = new double[n];
            double[] outZero = new double[n];
            arm.correct(in, temp, out, n);
            arm.correct(in, null, outNoTemp, n);
            arm.correct(in, temp, 12.5 * UE, outZero, n);
            for (int i = 0; i < n; i++) {
                assertEquals(arm.correct(in[i], temp[i]), out[i], 1e-20, "sample " + i);
                assertEquals(arm.correct(in[i]), outNoTemp[i], 1e-20, "sample " + i);
                assertEquals(arm.trace(in[i], temp[i]).corrected(), out[i], 1e-20);
                // Step 3 (LANGUAGE.md): less the arm's corrected zero reading.
                assertEquals(arm.trace(in[i], temp[i]).withBaseline(12.5 * UE).result(), outZero[i], 0);
            }
        }
    }

    @Test
    void traceRecordsEveryStepAndTheBaseline() {
        Gauge gauge = Gauge.withFactor(2.09).withThermal(-21.5 * UE, 2.10 * UE, -0.0430 * UE, 0.000155 * UE);
        ArmCorrection arm = new ArmCorrection(gauge, Bridge.QUARTER_3WIRE, 0.8, 2.00);
        CorrectionTrace base = arm.trace(5 * UE, 21.0);
        CorrectionTrace trace = arm.trace(412 * UE, 23.0);
        assertEquals(412 * UE, trace.indicated(), 0);
        assertEquals(arm.correct(412 * UE), trace.afterBridge(), 0);
        assertEquals(arm.thermalOutput(23.0), trace.thermalOutput(), 0);
        assertEquals(trace.afterBridge() - trace.thermalOutput(), trace.corrected(), 0);
        assertTrue(trace.thermalRemoved());
        CorrectionTrace step3 = trace.withBaseline(base.corrected());
        // LANGUAGE.md step 3: the case's corrected reading less the baseline's corrected reading.
        assertEquals(trace.corrected() - base.corrected(), step3.result(), 0);
        assertEquals(base.corrected(), step3.baseline().getAsDouble(), 0);
        assertThrows(GaugeException.class, () -> step3.withBaseline(0));
        CorrectionTrace noTemperature = arm.trace(412 * UE, null);
        assertFalse(noTemperature.thermalRemoved());
        assertEquals(noTemperature.afterBridge(), noTemperature.result(), 0);
    }

    @Test
    void badReadingsAreRefusedWithTheValueNamed() {
        ArmCorrection arm = ArmCorrection.atGaugeFactor(Gauge.withFactor(2.0), Bridge.QUARTER, 0);
        GaugeException nan = assertThrows(GaugeException.class, () -> arm.correct(Double.NaN));
        assertTrue(nan.getMessage().contains("NaN"), nan.getMessage());
        assertThrows(GaugeException.class, () -> arm.correct(Double.POSITIVE_INFINITY));
        assertThrows(GaugeException.class, () -> arm.correct(100 * UE, Double.NaN));
        assertThrows(GaugeException.class, () -> arm.correct(100 * UE, -300));
        // F_inst * e / 4 = 0.5: the bridge output of an infinite resistance.
        GaugeException pole = assertThrows(GaugeException.class, () -> arm.correct(1.0));
        assertTrue(pole.getMessage().contains("Vr = 0.5"), pole.getMessage());
        double[] column = {1e-4, 2e-4, Double.NEGATIVE_INFINITY};
        GaugeException inColumn = assertThrows(GaugeException.class,
                () -> arm.correct(column, null, new double[3], 3));
        assertTrue(inColumn.getMessage().contains("sample 2"), inColumn.getMessage());
        double[] temps = {20, Double.NaN, 20};
        ArmCorrection thermal = ArmCorrection.atGaugeFactor(Gauge.withFactor(2.0).withThermal(1e-6), Bridge.NONE, 0);
        assertThrows(GaugeException.class, () -> thermal.correct(new double[3], temps, new double[3], 3));
        assertThrows(GaugeException.class, () -> arm.trace(Double.NaN, null));
    }

    @Test
    void badSetUpIsRefused() {
        Gauge g = Gauge.withFactor(2.0);
        assertThrows(GaugeException.class, () -> new ArmCorrection(g, Bridge.NONE, 0.5, 2.0));
        assertThrows(GaugeException.class, () -> new ArmCorrection(g, Bridge.QUARTER, -0.1, 2.0));
        assertThrows(GaugeException.class, () -> new ArmCorrection(g, Bridge.QUARTER, 0, 0));
        assertThrows(GaugeException.class, () -> new ArmCorrection(g, Bridge.QUARTER, 0, Double.NaN));
        assertThrows(GaugeException.class, () -> new ArmCorrection(null, Bridge.QUARTER, 0, 2));
        assertThrows(GaugeException.class, () -> new ArmCorrection(g, null, 0, 2));
    }
}
