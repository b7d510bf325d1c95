package org.assay.audit;

import java.nio.file.Path;
import org.assay.data.ReadOptions;

/**
 * One reproduction to audit: the predictions a user produced for one row of one claims table.
 *
 * @param tableId     claims table the predictions reproduce; null when the claims file has one table
 * @param row         row label of the reproduced method; null when the table has one row
 * @param predictions predictions file
 * @param options     how to read it (columns, positive class, manifest, truth)
 */
public record Reproduction(String tableId, String row, Path predictions, ReadOptions options) {}
