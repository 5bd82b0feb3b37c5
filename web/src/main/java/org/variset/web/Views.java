package org.variset.web;

import gg.jte.ContentType;
import gg.jte.TemplateEngine;
import gg.jte.output.StringOutput;
import io.javalin.http.Context;
import java.util.Map;

/** The pages' templates, compiled at build time; every value written into a page is escaped unless marked. */
public final class Views {
    private final TemplateEngine engine = TemplateEngine.createPrecompiled(ContentType.Html);

    /** Renders a template with its parameters into the response, as UTF-8 HTML. */
    public void render(Context ctx, String template, Map<String, Object> params) {
        StringOutput out = new StringOutput();
        engine.render(template, params, out);
        ctx.contentType("text/html; charset=utf-8");
        ctx.result(out.toString());
    }
}
