package ionmark.speciation.internal.estimate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

import ionmark.acidity.api.PairRule;
import ionmark.acidity.api.SiteType;
import ionmark.speciation.api.Term;
import ionmark.speciation.internal.AtomText;
import ionmark.speciation.internal.sites.CompiledTable;
import ionmark.speciation.internal.sites.MatchTarget;

/**
 * The table's pair rules: two sites of one kind that hold each other's proton (or charge) move
 * together, and their coupling in the microstate model grows by the rule's interaction.
 */
public final class PairRules {
    private final CompiledTable table;

    public PairRules(CompiledTable table) {
        this.table = table;
    }

    /**
     * The table's pair rules applied: for every two titratable sites of one kind that a rule joins
     * (its :1 atom on one site, its :2 atom on the other; the first rule in table order wins), both
     * values move by the rule's singly charged term (acids down, bases up, each with its derivation
     * term) and {@link PairRule#interaction()} is added to the pair's entry in
     * {@code inter}; {@code used} collects the rule ids. A site in no pair is returned as it came.
     */
    public List<EstimatedSite> apply(MatchTarget target, List<EstimatedSite> est, double[][] inter,
            Set<String> used) {
        List<CompiledTable.Pair> rules = table.pairs();
        if (rules.isEmpty()) {
            return est;
        }
        List<EstimatedSite> titr = est.stream().filter(s -> !s.site().group().permanent()).toList();
        if (titr.size() < 2) {
            return est;
        }
        int[] siteAt = new int[target.atomCount()];
        Arrays.fill(siteAt, -1);
        for (int k = 0; k < titr.size(); k++) {
            siteAt[titr.get(k).site().atom()] = k;
        }
        EstimatedSite[] now = titr.toArray(new EstimatedSite[0]);
        boolean[][] joined = new boolean[titr.size()][titr.size()];
        for (CompiledTable.Pair rule : rules) {
            for (int i = 0; i < titr.size(); i++) {
                final int a = i;
                rule.pattern().forEach(target, titr.get(i).site().atom(), m -> {
                    int b = siteAt[m[rule.partner()]];
                    if (b < 0 || b == a || joined[a][b]
                            || titr.get(a).site().group().type() != titr.get(b).site().group().type()) {
                        return true;
                    }
                    joined[a][b] = true;
                    joined[b][a] = true;
                    used.add(rule.rule().id());
                    inter[a][b] += rule.rule().interaction();
                    inter[b][a] += rule.rule().interaction();
                    now[a] = held(now[a], titr.get(b), rule.rule());
                    now[b] = held(now[b], titr.get(a), rule.rule());
                    return true;
                });
            }
        }
        List<EstimatedSite> out = new ArrayList<>(est.size());
        for (EstimatedSite s : est) {
            int k = EstimatedSite.indexOf(titr, s);
            out.add(k < 0 ? s : now[k]);
        }
        return out;
    }

    private EstimatedSite held(EstimatedSite s, EstimatedSite partner, PairRule rule) {
        boolean base = s.site().group().type() == SiteType.BASE;
        double d = base ? rule.singly() : -rule.singly();
        // "pair rule with the %s site on atom %d (%s): singly %s form held by %.2f, doubly %s form dearer by %.2f;
        // the pair's interaction grows by %.2f", written without a Formatter (Decimals)
        String form = base ? "protonated" : "deprotonated";
        StringBuilder text = new StringBuilder(160).append("pair rule with the ").append(partner.site().group().id())
                .append(" site on atom ").append(AtomText.shown(partner.site().atom())).append(" (").append(rule.name())
                .append("): singly ").append(form).append(" form held by ");
        Decimals.append(text, rule.singly(), 2, false).append(", doubly ").append(form).append(" form dearer by ");
        Decimals.append(text, rule.doubly(), 2, false).append("; the pair's interaction grows by ");
        String label = Decimals.append(text, rule.interaction(), 2, false).toString();
        return s.shifted(d, new Term(label, d, table.table().citation(rule.source()), List.of(partner.site().atom())), s.basis(), s.sd());
    }
}
