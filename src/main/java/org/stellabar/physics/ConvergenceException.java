package org.stellabar.physics;

/**
 * An iteration that hit its bound without meeting its convergence test. This is a failure of
 * the method (exit status 1), not of the input; the message names the iteration, the count and
 * the last residual so that the case can be reproduced.
 */
public class ConvergenceException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** @param message what did not converge, after how many steps, with what residual */
    public ConvergenceException(String message) {
        super(message);
    }
}
