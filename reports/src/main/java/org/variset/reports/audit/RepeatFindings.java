package org.variset.reports.audit;

import java.util.ArrayList;
import java.util.List;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.scoring.repetition.RepetitionFigures;

/** Sentences for near-repeats: against the look-back window, then inside the set itself. */
final class RepeatFindings {
    private static final int SHOWN = 3;

    private RepeatFindings() {}

    static void add(Audit audit, List<Finding> out) {
        RepetitionFigures rep = audit.audited().repetition();
        if (rep == null) {
            return;
        }
        List<RepetitionFigures.Pair> near = byJaccard(rep.nearRepeats());
        for (int i = 0; i < Math.min(SHOWN, near.size()); i++) {
            RepetitionFigures.Pair p = near.get(i);
            out.add(new Finding(
                    "near_repeat",
                    9 - i * 0.01,
                    p.route() + " repeats " + p.other() + ": "
                            + p.evidence().words() + " (Jaccard "
                            + Figures.JACCARD.text(p.similarity().jaccard()) + ")."));
        }
        if (near.size() > SHOWN) {
            out.add(new Finding(
                    "near_repeat",
                    8.9,
                    (near.size() - SHOWN) + " more near-repeats of earlier routes"
                            + " (listed in the repetition table)."));
        }
        List<RepetitionFigures.Pair> inside = byJaccard(rep.internalRepeats());
        for (int i = 0; i < Math.min(SHOWN, inside.size()); i++) {
            RepetitionFigures.Pair p = inside.get(i);
            out.add(new Finding(
                    "internal_repeat",
                    8.5 - i * 0.01,
                    p.route() + " and " + p.other()
                            + " are near-repeats of each other in this set: "
                            + p.evidence().words() + " (Jaccard "
                            + Figures.JACCARD.text(p.similarity().jaccard()) + ")."));
        }
    }

    /** Most similar first (stable for equal indexes). */
    static List<RepetitionFigures.Pair> byJaccard(List<RepetitionFigures.Pair> pairs) {
        List<RepetitionFigures.Pair> out = new ArrayList<>(pairs);
        out.sort((a, b) ->
                Double.compare(b.similarity().jaccard(), a.similarity().jaccard()));
        return out;
    }
}
