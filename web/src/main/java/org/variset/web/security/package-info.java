/**
 * Who may reach what: sessions kept on the server behind an HttpOnly, SameSite=Strict cookie, a CSRF token per
 * session checked on every state-changing request, a sign-in rate limit per account and per address, and the role each
 * route needs, checked on every request before its handler runs (ADR 0007).
 */
package org.variset.web.security;
