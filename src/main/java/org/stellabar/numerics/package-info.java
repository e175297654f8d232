/**
 * Small numerical building blocks that Hipparchus does not offer in the form the inner loops
 * need (allocation-free, derivative-aware). Everything else numerical comes from Hipparchus.
 */
package org.stellabar.numerics;
