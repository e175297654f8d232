package org.stellabar.structure;

/**
 * One point of a Lane-Emden function.
 *
 * @param xi dimensionless radius ξ
 * @param theta θ(ξ), with ρ/ρ_c = θⁿ and P/P_c = θⁿ⁺¹
 * @param dthetaDxi dθ/dξ
 */
public record LaneEmdenPoint(double xi, double theta, double dthetaDxi) {
}
