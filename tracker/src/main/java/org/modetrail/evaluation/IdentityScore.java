package org.modetrail.evaluation;

/**
 * The identity figures ({@link IdentityMeasures}).
 *
 * @param idf1      2 IDTP / (truth boxes + track boxes); NaN when both are empty
 * @param idPrecision IDTP / track boxes
 * @param idRecall  IDTP / truth boxes
 * @param idTruePositives  boxes matched under the one-to-one pairing of whole trajectories
 * @param idFalseNegatives truth boxes not so matched
 * @param idFalsePositives track boxes not so matched
 */
public record IdentityScore(double idf1, double idPrecision, double idRecall, int idTruePositives,
                            int idFalseNegatives, int idFalsePositives) {
}
