package org.assay.audit;

import org.assay.claims.Claim;

/** A claim of the claims file that this audit did not test, and why (nothing is dropped silently). */
public record UnauditedClaim(Claim claim, String reason) {}
