/**
 * Reading input files into rows of cells: CSV (Commons CSV, with strict UTF-8, byte-order mark and delimiter
 * detection), XLSX (Apache POI, with its zip-bomb and size limits on) and JSON (Jackson). Which table a file holds
 * (routes, holds, walls) is read from its name and its header.
 */
package org.variset.imports.table;
