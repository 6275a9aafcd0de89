package org.ladderkin.gui.view;

import java.util.List;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;

/**
 * The plan's half of the status bar for a plan that reads: "readable" only says the file is a plan, so the line goes
 * on with what the risk table says about it, and never calls a plan that fails its own limits "valid".
 */
final class PlanStatus {

    private PlanStatus() {
    }

    /**
     * @param risks the current plan's risks, or null while they are being computed
     */
    static String readable(List<Risk> risks) {
        if (risks == null) {
            return "plan readable — checking the risks…";
        }
        if (risks.isEmpty()) {
            return "plan readable — no risks apply";
        }
        long fail = risks.stream().filter(r -> r.verdict() == Verdict.FAIL).count();
        long warn = risks.stream().filter(r -> r.verdict() == Verdict.WARN).count();
        if (fail == 0 && warn == 0) {
            return "plan readable — all " + risks.size() + " risks pass";
        }
        StringBuilder b = new StringBuilder("plan readable — ");
        if (fail > 0) {
            b.append(fail).append(fail == 1 ? " risk fails" : " risks fail");
            if (warn > 0) {
                b.append(", ").append(warn).append(warn == 1 ? " warns" : " warn");
            }
        } else {
            b.append(warn).append(warn == 1 ? " risk warns" : " risks warn");
        }
        return b.toString();
    }

    /** The worst verdict among {@code risks}, or PASS for none: colours the status text. */
    static Verdict worst(List<Risk> risks) {
        Verdict worst = Verdict.PASS;
        for (Risk r : risks) {
            worst = worst.worst(r.verdict());
        }
        return worst;
    }
}
