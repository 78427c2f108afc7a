package org.clearance.spark;

import java.io.Serializable;

/**
 * What one span's tasks hand to the run writer: a run model of that span alone (format of
 * model.json), its rows of the conductor table, its near points (a near-points.bin of that span),
 * and the measurements of the work for the skew report.
 *
 * @param key the span's key in the job
 * @param line index of its line
 * @param modelJson the one-span run model
 * @param conductorRows rows of conductors.csv, without the header
 * @param uncertaintyRows rows of uncertainty.csv, without the comment and header lines
 * @param nearPoints the span's near-points.bin, or null when none was written
 * @param ground the span's ground model counts
 * @param points points of its work area
 * @param fitSeconds time of ground and wires, s
 * @param measureSeconds time of conditions and distances, s
 * @param failure what failed, or null
 */
record SpanOutcome(int key, int line, String modelJson, String conductorRows,
    String uncertaintyRows, byte[] nearPoints,
    GroundTally ground, long points, double fitSeconds, double measureSeconds, String failure)
    implements Serializable {}
