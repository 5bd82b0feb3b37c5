/**
 * Accounts of the web workspace: who may sign in, with which role, over which gyms, and the checking of their
 * passwords. The command line makes and changes accounts ({@code variset user}); the web workspace signs them in.
 */
package org.variset.app.account;
