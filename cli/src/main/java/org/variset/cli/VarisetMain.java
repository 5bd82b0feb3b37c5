package org.variset.cli;

/** The program's entry point: the only place that exits the JVM. */
public final class VarisetMain {
    private VarisetMain() {}

    /**
     * Runs one command and exits with its status.
     *
     * @param args the command line
     */
    public static void main(String[] args) {
        System.exit(VarisetCli.system().run(args));
    }
}
