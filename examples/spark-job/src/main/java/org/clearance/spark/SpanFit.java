package org.clearance.spark;

import org.clearance.ground.GroundModel;
import org.clearance.wire.SpanWires;
import org.clearance.wire.WireFinder;

/**
 * A span after ground and wires: kept in executor memory between the stages (never shuffled).
 *
 * @param key the span's key in the job
 * @param ground its ground model (null when the task failed)
 * @param wires its fitted conductors (not assessed, with the reason, when the task failed)
 * @param found its wire evidence and candidates, until its points are set aside (null when the
 *     task failed)
 * @param meanGps the span's flight time: mean GPS time of the points that date it, s, or NaN
 *     ({@link org.clearance.wire.FlightTimes})
 * @param points points of its work area
 * @param classCounts points per ASPRS class in its work area
 * @param gpsRange earliest and latest GPS time of its points, s (NaN when none has one)
 * @param seconds time of the task, s
 * @param failure what failed, or null
 */
record SpanFit(int key, GroundModel ground, SpanWires wires, WireFinder.SpanFind found,
    double meanGps, long points, long[] classCounts, double[] gpsRange, double seconds,
    String failure) {}
