/** picocli converters for option values ({@code <Type>Converter}); a bad value becomes a usage error. */
package org.variset.cli.convert;
