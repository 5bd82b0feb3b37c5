/** The invented demo gym and the seeded generator that makes it. Filled by the sample-archive work. */
package org.variset.sample;
