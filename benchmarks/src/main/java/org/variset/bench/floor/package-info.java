/** The import floor: the same files parsed, stored and indexed with plain library calls and nothing else. */
package org.variset.bench.floor;
