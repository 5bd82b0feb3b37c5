package org.variset.bench;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The start-up baseline: a picocli program that only prints its version, shipped alone in bare-picocli.jar. */
@Command(
        name = "bare",
        mixinStandardHelpOptions = true,
        version = "bare 1.0",
        description = "Prints its version; the floor for a command-line program's start-up.")
public final class BareCli implements Runnable {
    @Override
    public void run() {
        System.out.println("bare 1.0");
    }

    /**
     * Runs the command line.
     *
     * @param args the command line
     */
    public static void main(String[] args) {
        System.exit(new CommandLine(new BareCli()).execute(args));
    }
}
