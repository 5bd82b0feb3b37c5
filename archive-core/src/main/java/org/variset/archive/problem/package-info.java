/**
 * What can go wrong, as typed values that every front end words in its own terms: an {@link
 * org.variset.archive.problem.ArchiveException} for the archive itself, an {@link
 * org.variset.archive.problem.InputException} for what a person gave, each with a {@link
 * org.variset.archive.problem.Remedy} (what the person can do about it, with the facts a message needs). Messages here
 * say what is wrong in plain words; they never name a command-line option or a button.
 */
package org.variset.archive.problem;
