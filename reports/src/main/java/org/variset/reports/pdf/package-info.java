/**
 * PDF documents: the reset audit, the annual report and the study sheet, written with OpenPDF, with charts drawn as
 * vector graphics by JFreeChart (and directly, for the grip rose and route sketches) through OpenPDF's Graphics2D.
 * Fonts are embedded (DejaVu Sans, bundled with its licence); colours follow the Okabe-Ito palette and every chart is
 * labelled so that nothing depends on colour alone.
 */
package org.variset.reports.pdf;
