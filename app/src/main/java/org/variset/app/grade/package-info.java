/** Reading a grade as setters write it, on the IRCRA axis, with its equivalents ({@link org.variset.app.grade.ReadGrade}). */
package org.variset.app.grade;
