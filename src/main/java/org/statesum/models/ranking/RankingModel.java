package org.statesum.models.ranking;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.statesum.engine.Cancellation;
import org.statesum.engine.Series;
import org.statesum.engine.Warning;
import org.statesum.models.Quantity;
import org.statesum.models.ThermoResult;
import org.statesum.models.reaction.ReactionModel;
import org.statesum.models.reaction.ReactionSpecies;
import org.statesum.models.reaction.SignChange;
import org.statesum.models.reaction.SpeciesThermo;

/**
 * Orders candidates by G at each temperature. The gap of candidate i is G_i - G_min with bound
 * b_i + b_min; candidates whose gap is within its bound are tied with the most stable one, and the
 * verdict is certain only when no other candidate is tied. Exchanges: for each pair not tied on the whole
 * grid, the temperatures
 * where G_a - G_b changes sign between grid points, found as the sign changes of the reaction a -&gt; b
 * ({@link ReactionModel}: Brent's method on the re-evaluated models), each with its bound.
 */
public final class RankingModel {

    private RankingModel() {
    }

    /** One candidate: its name and its thermodynamics (all candidates in one standard state). */
    public record Candidate(String name, SpeciesThermo thermo) {
    }

    /** Where two candidates exchange places: below {@code temperatureKelvin} {@code lowerBelow} has the lower G. */
    public record Exchange(String first, String second, String lowerBelow, SignChange at) {
    }

    /**
     * The ranking at one temperature.
     *
     * @param order candidate indices from the most stable up
     * @param gaps G_i - G_min per candidate (in input order), J per entity, with bounds
     * @param tied the candidates within their bound of the most stable one (the most stable included)
     */
    public record Rank(int[] order, double[] gaps, double[] gapBounds, int[] tied) {
    }

    /**
     * @param gibbs each candidate's G on the grid (J per entity)
     */
    public record Result(double[] temperaturesKelvin, List<Series> gibbs, List<Rank> ranks, List<Exchange> exchanges,
            List<Warning> warnings, Map<String, Object> precision) {
    }

    private static boolean tiedEverywhere(Series a, Series b) {
        for (int j = 0; j < a.values().length; j++) {
            if (!(Math.abs(a.values()[j] - b.values()[j]) <= a.errorBounds()[j] + b.errorBounds()[j])) {
                return false;
            }
        }
        return true;
    }

    public static Result evaluate(List<Candidate> candidates, double[] temperaturesKelvin, double rootToleranceKelvin) {
        int m = candidates.size();
        int n = temperaturesKelvin.length;
        List<Series> gibbs = new ArrayList<>();
        List<Warning> warnings = new ArrayList<>();
        for (Candidate c : candidates) {
            ThermoResult r = c.thermo().at(temperaturesKelvin);
            gibbs.add(r.series().get(Quantity.GIBBS_ENERGY));
            for (Warning w : r.warnings()) {
                warnings.add(new Warning(w.code(), "candidate '" + c.name() + "': " + w.message(), w.temperatures()));
            }
        }
        List<Rank> ranks = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            final int at = j;
            Integer[] order = new Integer[m];
            for (int i = 0; i < m; i++) {
                order[i] = i;
            }
            Arrays.sort(order, Comparator.comparingDouble(i -> gibbs.get(i).values()[at]));
            int best = order[0];
            double gMin = gibbs.get(best).values()[j];
            double bMin = gibbs.get(best).errorBounds()[j];
            double[] gaps = new double[m];
            double[] gapBounds = new double[m];
            List<Integer> tied = new ArrayList<>();
            for (int i = 0; i < m; i++) {
                gaps[i] = gibbs.get(i).values()[j] - gMin;
                gapBounds[i] = i == best ? 0 : gibbs.get(i).errorBounds()[j] + bMin + 0x1.0p-53 * Math.abs(gaps[i]);
                if (gaps[i] <= gapBounds[i]) {
                    tied.add(i);
                }
            }
            ranks.add(new Rank(Arrays.stream(order).mapToInt(Integer::intValue).toArray(), gaps, gapBounds,
                    tied.stream().mapToInt(Integer::intValue).sorted().toArray()));
        }
        List<Exchange> exchanges = new ArrayList<>();
        for (int a = 0; a < m; a++) {
            for (int b = a + 1; b < m; b++) {
                Cancellation.checkpoint();
                if (tiedEverywhere(gibbs.get(a), gibbs.get(b))) {
                    continue; // equal within the bounds on the whole grid: no order to exchange
                }
                Candidate ca = candidates.get(a);
                Candidate cb = candidates.get(b);
                // G_b - G_a: the reaction a -> b
                List<SignChange> roots = ReactionModel.evaluate(List.of(new ReactionSpecies(ca.name(), -1, ca.thermo()),
                        new ReactionSpecies(cb.name(), 1, cb.thermo())), temperaturesKelvin, rootToleranceKelvin)
                        .signChanges();
                for (SignChange s : roots) {
                    // rising: G_b - G_a goes from negative to positive, so b is lower below the root
                    exchanges.add(new Exchange(ca.name(), cb.name(), s.rising() ? cb.name() : ca.name(), s));
                }
            }
        }
        exchanges.sort(Comparator.comparingDouble(e -> e.at().temperatureKelvin()));
        Map<String, Object> precision = new LinkedHashMap<>();
        precision.put("arithmetic", "IEEE 754 binary64");
        precision.put("summation", "each candidate by its own model; gaps G_i - G_min with bound b_i + b_min, a gap "
                + "within its bound a tie");
        precision.put("rootFinder", "Brent (commons-math3 BrentSolver) on G_b - G_a between grid points of opposite "
                + "sign, the models re-evaluated at each trial temperature");
        precision.put("rootAbsoluteTolerance", rootToleranceKelvin);
        return new Result(temperaturesKelvin.clone(), gibbs, ranks, exchanges, warnings, precision);
    }
}
