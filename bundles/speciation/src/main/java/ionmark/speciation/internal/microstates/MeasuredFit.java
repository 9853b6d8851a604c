package ionmark.speciation.internal.microstates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.openscience.cdk.graph.invariant.Canon;
import org.openscience.cdk.interfaces.IAtomContainer;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Term;
import ionmark.speciation.internal.estimate.EstimatedSite;

/**
 * A structure that is one of the table's measured compounds: its site values are set so that the
 * microstate model reproduces the measured macroscopic constants, and those constants are moved to
 * the stated conditions by the model's own shifts.
 */
public final class MeasuredFit {
    private final AcidityTable table;

    public MeasuredFit(AcidityTable table) {
        this.table = table;
    }

    /**
     * Exact match: shift site values so that the model's macroscopic constants equal the measured
     * ones. The k measured values are given to the k sites (in pKa order) whose estimates lie
     * closest to them; the shifts are found by damped Gauss–Newton on the macroscopic constants.
     */
    public List<EstimatedSite> fit(IAtomContainer mol, int[][] adj, double[][] inter, List<EstimatedSite> est,
            MeasuredCompound m) {
        List<EstimatedSite> titr = new ArrayList<>(est.stream().filter(s -> !s.site().group().permanent()).toList());
        int k = m.pka().size();
        if (titr.size() < k || k == 0) {
            return est; // fewer sites than measured values: keep the estimates, say nothing false
        }
        titr.sort((a, b) -> Double.compare(a.pka(), b.pka()));
        int bestStart = 0;
        double bestCost = Double.MAX_VALUE;
        for (int start = 0; start + k <= titr.size(); start++) {
            double cost = 0;
            for (int i = 0; i < k; i++) {
                cost += Math.abs(titr.get(start + i).pka() - m.pka().get(i));
            }
            if (cost < bestCost) {
                bestCost = cost;
                bestStart = start;
            }
        }
        List<EstimatedSite> fitted = titr.subList(bestStart, bestStart + k);
        // topologically equivalent sites share one shift (phosphoric acid's three O-H stay equal)
        long[] sym = Canon.symmetry(mol, adj);
        List<Long> classes = new ArrayList<>();
        int[] classOf = new int[k];
        for (int i = 0; i < k; i++) {
            long c = sym[fitted.get(i).site().atom()];
            int idx = classes.indexOf(c);
            if (idx < 0) {
                classes.add(c);
                idx = classes.size() - 1;
            }
            classOf[i] = idx;
        }
        int p = classes.size();
        double[] param = new double[p];
        for (int i = 0; i < k; i++) {
            param[classOf[i]] += (m.pka().get(i) - fitted.get(i).pka()) / Collections.frequency(
                    Arrays.stream(classOf).boxed().toList(), classOf[i]);
        }
        double[] shift = new double[k];
        for (int i = 0; i < k; i++) {
            shift[i] = param[classOf[i]];
        }
        // the model at standard conditions is built once; a shift moves only its site values
        SiteModel standard = SiteInteractions.model(inter, est, Conditions.noPh());
        List<EstimatedSite> order = est.stream().filter(s -> !s.site().group().permanent()).toList();
        int[] at = new int[k];
        for (int i = 0; i < k; i++) {
            at[i] = EstimatedSite.indexOf(order, fitted.get(i));
        }
        for (int iter = 0; iter < 40; iter++) {
            double[] r = residual(standard, at, shift, m);
            double worst = Arrays.stream(r).map(Math::abs).max().orElse(0);
            if (worst < 1e-6) {
                break;
            }
            double[][] jac = new double[k][p];
            for (int j = 0; j < p; j++) {
                double[] trial = shift.clone();
                for (int i = 0; i < k; i++) {
                    if (classOf[i] == j) {
                        trial[i] += 1e-4;
                    }
                }
                double[] rj = residual(standard, at, trial, m);
                for (int i = 0; i < k; i++) {
                    jac[i][j] = (rj[i] - r[i]) / 1e-4;
                }
            }
            double[] step = solveDamped(jac, r, 1e-3);
            double norm = Arrays.stream(step).map(Math::abs).max().orElse(0);
            if (norm < 1e-7) {
                break; // least-squares optimum reached (fewer symmetry classes than constants)
            }
            double scale = norm > 1 ? 1 / norm : 1;
            for (int j = 0; j < p; j++) {
                param[j] -= scale * step[j];
            }
            for (int i = 0; i < k; i++) {
                shift[i] = param[classOf[i]];
            }
        }
        List<EstimatedSite> out = new ArrayList<>();
        for (EstimatedSite s : est) {
            int idx = EstimatedSite.indexOf(fitted, s);
            if (idx < 0) {
                out.add(s);
                continue;
            }
            out.add(s.shifted(shift[idx], new Term("measured compound " + m.name() + ": macroscopic pKa "
                    + m.pka() + " at " + Math.round(m.temperature()) + " °C (" + m.method()
                    + "); site value set to reproduce it", shift[idx], table.citation(m.source())),
                    ionmark.speciation.api.Basis.MEASURED, 0.05));
        }
        return out;
    }

    /**
     * Measured macroscopic constants moved to the stated conditions: each by the model's own shift of
     * the matching constant between 25 °C, I = 0 and the stated temperature and ionic strength
     * (van 't Hoff per class enthalpy, Davies). Exact at standard conditions.
     */
    public List<Double> atConditions(MeasuredCompound m, double[][] inter, List<EstimatedSite> est, double[] poly) {
        List<Double> here = MacroConstants.of(poly);
        List<Double> std = MacroConstants.of(MacroConstants.polynomial(SiteInteractions.model(inter, est, Conditions.noPh()),
                table.interaction().cutoff()));
        if (here.size() != std.size() || here.size() < m.pka().size()) {
            return m.pka();
        }
        // the model constants nearest the measured ones, in order
        int start = 0;
        double best = Double.MAX_VALUE;
        for (int s0 = 0; s0 + m.pka().size() <= std.size(); s0++) {
            double cost = 0;
            for (int i = 0; i < m.pka().size(); i++) {
                cost += Math.abs(std.get(s0 + i) - m.pka().get(i));
            }
            if (cost < best) {
                best = cost;
                start = s0;
            }
        }
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < m.pka().size(); i++) {
            out.add(m.pka().get(i) + here.get(start + i) - std.get(start + i));
        }
        return out;
    }

    /** Model constants minus measured ones, with site {@code at[i]} of the standard model moved by {@code shift[i]}. */
    private double[] residual(SiteModel standard, int[] at, double[] shift, MeasuredCompound m) {
        double[] pka = standard.pka().clone();
        for (int i = 0; i < at.length; i++) {
            pka[at[i]] += shift[i];
        }
        List<Double> macro = MacroConstants.of(new SiteModel(pka, standard.base(), standard.w(), standard.background()),
                table.interaction().cutoff());
        // compare the measured values with the macroscopic constants nearest in order
        int k = m.pka().size();
        int start = 0;
        double bestCost = Double.MAX_VALUE;
        for (int s0 = 0; s0 + k <= macro.size(); s0++) {
            double cost = 0;
            for (int i = 0; i < k; i++) {
                cost += Math.abs(macro.get(s0 + i) - m.pka().get(i));
            }
            if (cost < bestCost) {
                bestCost = cost;
                start = s0;
            }
        }
        double[] r = new double[k];
        for (int i = 0; i < k; i++) {
            r[i] = macro.get(start + i) - m.pka().get(i);
        }
        return r;
    }

    /** (JᵀJ + λI) x = Jᵀr by Gaussian elimination: m residuals, k parameters, both small. */
    private static double[] solveDamped(double[][] j, double[] r, double lambda) {
        int m = r.length;
        int k = j[0].length;
        double[][] a = new double[k][k + 1];
        for (int p = 0; p < k; p++) {
            for (int q = 0; q < k; q++) {
                double v = 0;
                for (int i = 0; i < m; i++) {
                    v += j[i][p] * j[i][q];
                }
                a[p][q] = v + (p == q ? lambda : 0);
            }
            double v = 0;
            for (int i = 0; i < m; i++) {
                v += j[i][p] * r[i];
            }
            a[p][k] = v;
        }
        for (int col = 0; col < k; col++) {
            int piv = col;
            for (int row = col + 1; row < k; row++) {
                if (Math.abs(a[row][col]) > Math.abs(a[piv][col])) {
                    piv = row;
                }
            }
            double[] tmp = a[col];
            a[col] = a[piv];
            a[piv] = tmp;
            if (Math.abs(a[col][col]) < 1e-15) {
                continue;
            }
            for (int row = 0; row < k; row++) {
                if (row != col) {
                    double f = a[row][col] / a[col][col];
                    for (int c = col; c <= k; c++) {
                        a[row][c] -= f * a[col][c];
                    }
                }
            }
        }
        double[] x = new double[k];
        for (int p = 0; p < k; p++) {
            x[p] = Math.abs(a[p][p]) < 1e-15 ? 0 : a[p][k] / a[p][p];
        }
        return x;
    }
}
