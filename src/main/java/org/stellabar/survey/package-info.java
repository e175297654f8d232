/**
 * Many computations at once: equation-of-state grids over the ρ–T (or P–T) plane, mass sequences
 * of standard models, and audits of profiles from other codes. Work is split into index ranges
 * that are independent of each other, so results are identical however many threads run them
 * (and a range can be given to one job of a cluster job array).
 */
package org.stellabar.survey;
