package org.assay.pdf;

/**
 * A "Table N" caption found on a page: its number as printed, its whole text, and its box.
 *
 * @param kind   "table" or "figure" (figure captions are found so that they are never taken for tables)
 */
public record Caption(String kind, String number, String text, double x0, double x1, double top, double bottom,
                      double size) {
    public boolean isTable() { return kind.equals("table"); }

    public double centerX() { return (x0 + x1) / 2; }
}
