package org.convgrid.engine.structure;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/** A structure solve that did not converge; carries the {@link SolveReport}. Kind: NOT_CONVERGED. */
public final class SolveFailedException extends ConvgridException {

    private static final long serialVersionUID = 1L;

    private final transient SolveReport report;

    public SolveFailedException(String what, SolveReport report) {
        super(ErrorKind.NOT_CONVERGED, what + ": " + report, report.reason(), report.iterations(),
                report.lastCorrection(), report.worstPoint());
        this.report = report;
    }

    public SolveReport report() {
        return report;
    }
}
