package org.stellabar.structure;

import java.util.OptionalDouble;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.table.Inputs;

/**
 * Eddington's standard model scaled to M and R: the n = 3 structure with T and β from the EOS
 * at each point (which reproduces the model's constant β), and the stability estimate in closed
 * form, as Γ1 is the same everywhere and K = K₃ ({@link EddingtonStandardModel#model}).
 */
public final class StandardModelBuilder implements StarModelBuilder<StandardModelRequest> {

    @Override
    public StarKind kind() {
        return StarKind.standard;
    }

    @Override
    public Class<StandardModelRequest> requestType() {
        return StandardModelRequest.class;
    }

    @Override
    public BuiltStar build(StandardModelRequest request, StarBuildContext shared) {
        EddingtonStandardModel model = shared.standardModel();
        StarStructure structure = new ScaledPolytropeStar(model.polytrope(), new GasRadiationEos(request.composition()))
                .build(request.mass(), request.radius(), request.points());
        StandardModelState state = model.model(request.mass(), request.radius(), request.composition());
        return new BuiltStar(structure, state.stability(), state.oneMinusBeta(),
                "standard model: L/L_Edd = 1 - beta (radiative equilibrium, kappa_es eta constant)",
                OptionalDouble.of(3.0), EddingtonStandardModel.ASSUMPTIONS);
    }

    @Override
    public void describeInputs(StandardModelRequest request, Inputs.Builder inputs) {
        inputs.number("n", 3.0, "", "polytropic index");
    }

    @Override
    public String title(StandardModelRequest request) {
        return "standard-model";
    }
}
