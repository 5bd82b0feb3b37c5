/** The web workspace: {@link org.variset.web.WebServer} and what it serves. */
package org.variset.web;
