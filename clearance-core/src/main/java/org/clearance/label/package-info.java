/**
 * Point labelling for surveys whose vegetation is not labelled (step after {@code wire}, before
 * {@code sag}): separates man-made objects (buildings, cranes and masts, fences, vehicles) from
 * vegetation among the unclassified points near the line, from local geometry (eigenvalue
 * dimensionality features), echo structure and the shape of each clustered object. Methods,
 * features and thresholds with their sources: docs/labelling.md.
 */
package org.clearance.label;
