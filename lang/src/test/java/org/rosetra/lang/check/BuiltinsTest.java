package org.rosetra.lang.check;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.rosetra.runtime.units.Dimension;

/** The registry holds every name LANGUAGE.md promises, each with a description. */
class BuiltinsTest {

    @Test
    void everyMemberOfARosettesResult() {
        // LANGUAGE.md, section "Results of a rosette", the table of members in its order.
        assertEquals(List.of("eps_x", "eps_y", "gamma_xy", "eps_1", "eps_2", "theta_p", "gamma_max", "eps_z",
                "sigma_x", "sigma_y", "tau_xy", "sigma_1", "sigma_2", "sigma_z", "tau_max", "tau_abs",
                "von_mises", "tresca"), Builtins.resultMembers().stream().map(BuiltinMember::name).toList());
        assertEquals(Dimension.ANGLE, Builtins.resultMember("theta_p").orElseThrow().dimension());
        assertEquals(Dimension.STRESS, Builtins.resultMember("von_mises").orElseThrow().dimension());
    }

    @Test
    void everyBuiltInFunction() {
        // LANGUAGE.md, section "Expressions, values and checks" and "Results of a rosette".
        for (String name : List.of("sqrt", "abs", "sin", "cos", "tan", "atan2", "min", "max", "strain_at",
                "shear_at", "stress_at", "shear_stress_at", "mohr_coulomb", "rankine")) {
            BuiltinFunction function = Builtins.function(name).orElseThrow(() -> new AssertionError(name));
            assertFalse(function.doc().isBlank(), name);
        }
    }

    @Test
    void fieldsOfEveryBlock() {
        // LANGUAGE.md, section "Declarations": the fields and their dimensions.
        assertEquals(Dimension.STRESS, Builtins.field(BlockKind.MATERIAL, "E").orElseThrow().dimension());
        assertEquals(Dimension.RESISTANCE, Builtins.field(BlockKind.GAUGE, "resistance").orElseThrow().dimension());
        assertTrue(Builtins.field(BlockKind.GAUGE, "factor").orElseThrow().required());
        assertTrue(Builtins.field(BlockKind.ROSETTE, "layout").orElseThrow().required());
        assertTrue(Builtins.field(BlockKind.ROSETTE, "gauge").orElseThrow().required());
        assertEquals(Dimension.ANGLE, Builtins.field(BlockKind.ROSETTE, "angle").orElseThrow().dimension());
        assertEquals(3, Builtins.layoutArms("delta").getAsInt());
        assertEquals(2, Builtins.layoutArms("tee").getAsInt());
    }
}
