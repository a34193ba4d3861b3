package org.exitance.result;

/**
 * One solved load case.
 *
 * @param name        the load case's name ("as given" for a case without load cases)
 * @param description its description, or "" when it has none
 * @param result      the solve of the case with this load case applied
 */
public record LoadCaseResult(String name, String description, SolveResult result) {
}
