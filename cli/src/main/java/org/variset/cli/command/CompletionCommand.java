package org.variset.cli.command;

import java.util.List;
import org.variset.app.Workspace;
import org.variset.app.names.NameCandidates;
import org.variset.cli.ExitCode;
import picocli.AutoComplete;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;

/** Writes a completion script for bash or zsh; the script asks the archive for names as the user types. */
@Command(
        name = "completion",
        mixinStandardHelpOptions = true,
        description = {
            "Print a completion script for bash or zsh: commands and options complete with TAB, and the names after "
                    + "--gym, --wall, --setter and --reset come from the archive as you type (the one the "
                    + "line being typed names with --archive, --db or --gym, else the usual default).",
            "",
            "Add this line to ~/.bashrc (bash) or ~/.zshrc (zsh), with the path to ./variset or a 'variset' on "
                    + "your PATH:",
            "  source <(variset completion bash)      # or: source <(variset completion zsh)"
        },
        footer = {"", "Example:", "  variset completion bash > ~/.local/share/bash-completion/completions/variset"})
final class CompletionCommand extends VarisetSubcommand {
    @Parameters(paramLabel = "SHELL", arity = "0..1", description = "bash or zsh.")
    String shell;

    @Option(names = "--names", hidden = true, paramLabel = "KIND", description = "Print names of a kind, one a line.")
    String names;

    @Mixin
    GymOptions gym;

    @Override
    ExitCode execute() {
        if (names != null) {
            return names();
        }
        if (shell == null || !List.of("bash", "zsh").contains(shell)) {
            throw new ParameterException(spec.commandLine(), "give the shell: bash or zsh");
        }
        // A run builds only the command it names; the script needs every one.
        CommandLine full = new CommandLine(root());
        RootCommand.addSubcommands(full, new String[0]);
        String script = AutoComplete.bash("variset", full);
        out().print(script);
        out().print(NAMES_HOOK);
        return ExitCode.OK;
    }

    /** The names for the script; nothing, quietly, when the archive cannot say (completion must never print errors). */
    private ExitCode names() {
        NameCandidates.Kind kind = NameCandidates.Kind.of(names);
        if (kind == null) {
            throw new ParameterException(
                    spec.commandLine(),
                    "--names takes one of " + NameCandidates.Kind.words() + ", not '" + names + "'");
        }
        try (Workspace w = workspace()) {
            new NameCandidates(w).names(kind, gym.gym).forEach(out()::println);
        } catch (RuntimeException e) {
            // An archive that is missing, locked or holds several gyms: no names, and no noise in the shell.
        }
        return ExitCode.OK;
    }

    /**
     * Wraps the generated completion function: after --gym, --wall, --setter or --reset it asks the archive for
     * names (quoted for the shell), with the --archive, --db and --gym already typed on the line; otherwise it
     * completes as generated.
     */
    private static final String NAMES_HOOK = """

            # Names from the archive after --gym, --wall, --setter and --reset (variset completion --names KIND).
            function _variset_with_names() {
              local cur="${COMP_WORDS[COMP_CWORD]}" prev="${COMP_WORDS[COMP_CWORD-1]}" kind=""
              case "$prev" in
                --gym) kind=gyms ;;
                --wall) kind=walls ;;
                --setter) kind=setters ;;
                --reset) kind=resets ;;
              esac
              if [[ -n "$kind" ]]; then
                local IFS=$'\\n' name i
                local -a archive=() gym=()
                for ((i = 1; i < COMP_CWORD - 1; i++)); do
                  case "${COMP_WORDS[i]}" in
                    --archive|--db) archive+=("${COMP_WORDS[i]}" "${COMP_WORDS[i+1]}") ;;
                    --gym) gym+=(--gym "${COMP_WORDS[i+1]}") ;;
                  esac
                done
                COMPREPLY=()
                for name in $("${COMP_WORDS[0]}" "${archive[@]}" completion --names "$kind" "${gym[@]}" 2>/dev/null); do
                  if [[ "$name" == "$cur"* ]]; then
                    COMPREPLY+=("$(printf '%q' "$name")")
                  fi
                done
                return 0
              fi
              _complete_variset "$@"
            }
            complete -F _variset_with_names -o default variset ./variset
            """;
}
