/**
 * One class per subcommand ({@code <Verb>Command}), the root command that lists them, and the shared option
 * groups ({@code <Topic>Options}). Each subcommand copies its options into core calls and prints the result.
 */
package org.variset.cli.command;
