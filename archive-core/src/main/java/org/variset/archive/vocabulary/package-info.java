/**
 * The vocabulary of hold types, move descriptors and style tags: canonical trade terms and the spellings that
 * map to them, one list per field. The defaults are data ({@code default-vocabulary.txt}); a gym's extension uses
 * the same form.
 */
package org.variset.archive.vocabulary;
