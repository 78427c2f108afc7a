package org.clearance.examples;

/**
 * A tension section of the demo line: the spans between two dead-end structures (truth).
 *
 * <p>The horizontal tensions were chosen at the reference temperature as a fraction of the rated
 * breaking strength and carried to the survey temperature on the ruling span by the parabolic
 * change-of-state equation ({@link ChangeOfState}).
 *
 * @param index zero-based section index
 * @param firstStructure index of the dead-end at the start
 * @param lastStructure index of the dead-end at the end
 * @param rulingSpanM ruling span sqrt(sum S^3 / sum S) of the centre-to-centre span lengths, m
 * @param referenceTemperatureC temperature at which the tensions were chosen, degC
 * @param phaseTensionReferenceN phase horizontal tension at the reference temperature, N
 * @param shieldTensionReferenceN shield-wire horizontal tension at the reference temperature, N
 * @param phaseTensionN phase horizontal tension at the survey temperature, N
 * @param shieldTensionN shield-wire horizontal tension at the survey temperature, N
 */
public record TensionSection(
    int index,
    int firstStructure,
    int lastStructure,
    double rulingSpanM,
    double referenceTemperatureC,
    double phaseTensionReferenceN,
    double shieldTensionReferenceN,
    double phaseTensionN,
    double shieldTensionN) {

  /** Survey-state horizontal tension of a role, N. */
  public double tension(DemoPosition.Role role) {
    return role == DemoPosition.Role.PHASE ? phaseTensionN : shieldTensionN;
  }
}
