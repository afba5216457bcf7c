package org.rosetra.lang.plan;

import org.rosetra.lang.syntax.Call;
import org.rosetra.lang.syntax.Expr;
import org.rosetra.lang.syntax.Index;
import org.rosetra.lang.syntax.Member;
import org.rosetra.runtime.results.MemberKind;
import org.rosetra.runtime.results.RosetteMember;

/**
 * Strain and a plain ratio are both dimensionless: whether a value is shown in microstrain
 * depends on what the expression is, a strain member or a strain function (or the extreme or
 * magnitude of one), or anything else.
 */
public final class StrainExpressions {
    private StrainExpressions() {}

    public static boolean isStrain(Expr e) {
        if (e instanceof Index ix) {
            return isStrain(ix.target());
        }
        if (e instanceof Member m) {
            return RosetteMember.byScriptName(m.member().text()).map(x -> x.kind() == MemberKind.STRAIN).orElse(false);
        }
        if (e instanceof Call c) {
            String f = c.function().text();
            return f.equals("strain_at") || f.equals("shear_at")
                    || ((f.equals("max") || f.equals("min") || f.equals("abs")) && !c.args().isEmpty()
                    && isStrain(c.args().get(0)));
        }
        return false;
    }
}
