package org.variset.reports.plan;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** A reset plan as one JSON document. */
public final class PlanJson {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private PlanJson() {}

    /** The plan as a JSON tree. */
    public static ObjectNode of(ResetPlan p) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("gym", p.gym())
                .put("wall", p.wall())
                .put("on", p.on().toString())
                .put("discipline", p.discipline().word())
                .put("routes", p.routes());
        ObjectNode grades = o.putObject("grade_slots");
        if (p.grades() != null) {
            ResetPlan.GradeSlots gs = p.grades();
            ArrayNode bands = grades.putArray("bands");
            for (int i = 0; i < gs.bands().size(); i++) {
                bands.addObject()
                        .put("band", gs.bands().get(i))
                        .put("up_elsewhere", gs.rest()[i])
                        .put("target_share", gs.targetShares()[i])
                        .put("previous_reset", gs.previousMix()[i])
                        .put("proposed", gs.slots()[i]);
            }
            grades.put("emd_to_target_now", gs.distanceNow())
                    .put("emd_to_target_after", gs.distanceAfter())
                    .put("outside_target", gs.outsideTarget())
                    .put("target_is_example", gs.targetIsDefault());
        }
        ArrayNode gaps = o.putArray("bring_back");
        p.gaps()
                .forEach(g -> gaps.addObject()
                        .put("field", g.field())
                        .put("category", g.category())
                        .put("standing_share", g.standingShare())
                        .put("baseline_share", g.baselineShare()));
        o.put("margin", p.margin());
        ObjectNode baseline = o.putObject("baseline").put("resets", p.baseline().resets());
        p.baseline().walls().forEach(baseline.putArray("walls")::add);
        o.put("shapes_on_wall", p.shapesOnWall());
        ObjectNode shapes = o.putObject("shapes_to_rest");
        p.shapesToRest().forEach(shapes::put);
        ObjectNode undefined = o.putObject("undefined");
        p.undefined().forEach(undefined::put);
        return o;
    }
}
