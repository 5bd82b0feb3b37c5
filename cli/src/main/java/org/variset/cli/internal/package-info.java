/** Console plumbing that is not part of any command's contract: logging set-up, JSON and table output. */
package org.variset.cli.internal;
