/**
 * Line conditions: loads (ice, wind), change of state on the ruling span, the survey tension of a
 * tension section, and the conductor of each span in each line condition (hot, iced, blown out,
 * swung, extra sag) for the clearance engine. Methods and sources: docs/methods.md
 * section 3 (CIGRE TB 324 sag-tension methods).
 */
package org.clearance.sag;
