/**
 * The command line: {@link org.variset.cli.VarisetMain} starts it, {@link org.variset.cli.VarisetCli} runs one
 * command in-process (tests use it), {@link org.variset.cli.ExitCode} lists what each exit status means.
 * This is the only module that prints to the console or exits.
 */
package org.variset.cli;
