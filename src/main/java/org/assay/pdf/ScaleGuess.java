package org.assay.pdf;

import org.assay.claims.Scale;

/**
 * How a column's printed values are scaled, as {@link ScaleGuesser} read it.
 *
 * @param scale      percent or fraction; null when nothing in the column tells
 * @param confidence in [0, 1]; 0 when scale is null
 * @param reason     one sentence saying what the guess rests on
 */
public record ScaleGuess(Scale scale, double confidence, String reason) {}
