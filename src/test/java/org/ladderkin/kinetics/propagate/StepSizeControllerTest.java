package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import org.assertj.core.data.Offset;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class StepSizeControllerTest {

    private final StepSizeController controller = new StepSizeController(RadauStepper.MAX_NEWTON);

    @Test
    void growthAndShrinkAreBounded() {
        assertThat(controller.factor(0.0, 1)).isEqualTo(StepSizeController.MAX_GROWTH);
        assertThat(controller.factor(1e-30, 1)).isEqualTo(StepSizeController.MAX_GROWTH);
        assertThat(controller.factor(1e30, 1)).isEqualTo(StepSizeController.MIN_SHRINK);
    }

    @Test
    void factorFollowsTheFourthRootOfTheErrorAndTrustsFewNewtonIterationsMore() {
        double f1 = controller.factor(16.0, 1);
        assertThat(f1).isCloseTo(0.9 / 2, Offset.offset(1e-12));
        assertThat(controller.factor(0.5, 6)).isLessThan(controller.factor(0.5, 1));
    }

    @Test
    void initialStepFollowsTheFastestTimeScale() {
        ErrorScale scale = new ErrorScale(new Tolerances(1e-10, 1e-8));
        double k = 1e12;
        double h = StepSizeController.initialStep(StiffFixtures.decay(k), 0, new double[] {1}, new double[] {-k},
                scale, 1e-3);
        assertThat(h).isBetween(1e-16, 1e-11);
        double hSlow = StepSizeController.initialStep(StiffFixtures.decay(1), 0, new double[] {1}, new double[] {-1},
                scale, 100);
        assertThat(hSlow).isGreaterThan(1e3 * h).isLessThanOrEqualTo(100);
    }

    @Test
    @CheckedAgainst(source = "derived: y' = -k(t) y with k = 1/s for t < 1 s and 10/s after has y(2 s) = exp(-11)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void rateJumpIsCrossedByRejectingAndShrinkingSteps() {
        StiffSystem jump = new StiffFixtures.LinearSystem(1, (t, m) -> m[0][0] = t < 1 ? -1 : -10);
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-12, 1e-8))
                .integrate(jump, 0, new double[] {1}, new double[] {2});
        assertThat(r.rejectedSteps()).isPositive();
        Reference.checkRelative("y(2 s) across a rate jump at 1 s", r.states()[0][0], Math.exp(-11), 1e-6);
    }
}
