package org.variset.reports.plan;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** A reset plan as one JSON document. */
public final class PlanJson {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private PlanJson() {
    }

    /** The plan as a JSON tree. */
    public static ObjectNode of(ResetPlan p) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("gym", p.gym()).put("wall", p.wall()).put("on", p.on().toString())
                .put("discipline", p.discipline().word()).put("routes", p.routes());
        ObjectNode grades = o.putObject("grade_slots");
        if (p.slots() != null) {
            ArrayNode bands = grades.putArray("bands");
            for (int i = 0; i < p.bands().size(); i++) {
                bands.addObject().put("band", p.bands().get(i)).put("up_elsewhere", p.rest()[i])
                        .put("target_share", p.targetShares()[i]).put("previous_reset", p.previousMix()[i])
                        .put("proposed", p.slots()[i]);
            }
            grades.put("emd_to_target_now", p.distanceNow()).put("emd_to_target_after", p.distanceAfter())
                    .put("outside_target", p.outsideTarget()).put("target_is_example", p.targetIsDefault());
        }
        ArrayNode gaps = o.putArray("bring_back");
        p.gaps().forEach(g -> gaps.addObject().put("field", g.field()).put("category", g.category())
                .put("standing_share", g.standingShare()).put("year_share", g.yearShare()));
        o.put("margin", p.margin());
        ObjectNode shapes = o.putObject("shapes_to_rest");
        p.shapesToRest().forEach(shapes::put);
        ObjectNode undefined = o.putObject("undefined");
        p.undefined().forEach(undefined::put);
        return o;
    }
}
