package org.variset.cli.command;

import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.names.ListSetters;
import org.variset.cli.ExitCode;
import org.variset.cli.render.NameText;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** Lists the setters who set in a gym. */
@Command(
        name = "setters",
        mixinStandardHelpOptions = true,
        description = "List the setters who set in a gym, with how many routes and the first and latest day. "
                + "To rename or merge a name, see 'variset setter --help'.",
        footer = {"", "Example:", "  variset setters --format json"})
final class SettersCommand extends VarisetSubcommand {
    @Mixin
    GymOptions gym;

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        ListSetters.Result r;
        try (Workspace w = workspace()) {
            r = new ListSetters(w).list(gym.gym);
        }
        out().print(format.json() ? Json.write(r.json()) + "\n" : NameText.setters(r));
        return ExitCode.OK;
    }
}
