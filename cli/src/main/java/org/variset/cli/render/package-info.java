/**
 * How the command line says things: results as text for people, and the words of the CLI for what the layers below
 * report in neutral terms (a {@link org.variset.archive.problem.Remedy} becomes "give --force to replace it").
 */
package org.variset.cli.render;
