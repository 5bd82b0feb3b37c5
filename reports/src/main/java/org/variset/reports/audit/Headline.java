package org.variset.reports.audit;

import java.util.LinkedHashMap;
import java.util.Map;
import org.variset.reports.catalogue.Figure;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.scoring.grades.GradeFigures;

/**
 * The values of the figures an audit sets side by side ({@link Figures#HEADLINE}: this set, the previous reset, the
 * reference set), keyed by their catalogue keys.
 */
public final class Headline {
    private Headline() {}

    /** The headline figures of a set (null where undefined), in {@link Figures#HEADLINE} order. */
    public static Map<String, Double> of(SetResult s) {
        SetFigures f = s.figures();
        GradeFigures g = Findings.mainGrades(f);
        Map<Figure, Double> m = new LinkedHashMap<>();
        m.put(Figures.SCORE, s.score().score());
        m.put(Figures.GRIP_SECTOR_ENTROPY, f.grip().sectorEntropy());
        m.put(Figures.GRIP_UP, f.sectorShare(0));
        m.put(Figures.GRIP_RESULTANT, f.grip().resultantLength());
        m.put(Figures.HOLDS.hillN1(), f.holds().hillN1());
        m.put(Figures.HOLDS.coverage(), f.holds().coverage());
        m.put(Figures.MOVES.coverage(), f.moves().coverage());
        m.put(Figures.STYLES.hillN1(), f.styles().hillN1());
        m.put(Figures.GRADES_DISTANCE, g == null ? null : g.emdToTarget());
        m.put(Figures.NOVELTY, s.repetition() == null ? null : s.repetition().novelty());
        m.put(Figures.HOLD_REUSE, s.holdReuseRate());
        m.put(Figures.PROFILE_SPREAD, f.profiles().splitEntropy());
        m.put(Figures.GIE_MEAN, f.line().gieMean());
        Map<String, Double> out = new LinkedHashMap<>();
        for (Figure x : Figures.HEADLINE) {
            if (!m.containsKey(x)) {
                throw new IllegalStateException("no value for the headline figure " + x.key());
            }
            out.put(x.key(), m.get(x));
        }
        return out;
    }
}
