package ionmark.speciation.internal.profile;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;

import ionmark.acidity.api.SiteType;
import ionmark.speciation.api.Species;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.estimate.Overrides;
import ionmark.speciation.internal.microstates.Populations;
import ionmark.speciation.internal.structure.StructureReader;

/** The leading species at a pH, each written as a structure with its net charge and fraction. */
public final class SpeciesList {
    private SpeciesList() {
    }

    /** Species fractions rescaled within each net charge so that they add up to the given charge states. */
    public static List<Species> consistentWith(List<Species> species, Map<Integer, Double> model,
            Map<Integer, Double> target) {
        List<Species> out = new ArrayList<>();
        for (Species s : species) {
            double m = model.getOrDefault(s.charge(), 0.0);
            double f = m > 0 ? s.fraction() * target.getOrDefault(s.charge(), 0.0) / m : s.fraction();
            out.add(new Species(s.smiles(), s.charge(), f));
        }
        out.sort((a, b) -> Double.compare(b.fraction(), a.fraction()));
        return out;
    }

    /** Leading species; microstates that are the same species (equivalent sites) are merged. */
    public static List<Species> species(IAtomContainer mol, List<EstimatedSite> titr, Populations pop, int permanent) {
        List<Species> out = new ArrayList<>();
        List<String> keys = new ArrayList<>();
        for (Populations.Microstate m : pop.top()) {
            if (m.fraction() < 0.001 && !out.isEmpty()) {
                break;
            }
            try {
                IAtomContainer copy = mol.clone();
                int z = permanent;
                List<Integer> cations = new ArrayList<>();
                List<Integer> anions = new ArrayList<>();
                for (int i = 0; i < titr.size(); i++) {
                    IAtom a = copy.getAtom(titr.get(i).site().atom());
                    boolean base = titr.get(i).site().group().type() == SiteType.BASE;
                    boolean dep = m.deprotonated()[i];
                    int h = a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
                    int q = a.getFormalCharge() == null ? 0 : a.getFormalCharge();
                    if (base && !dep) {
                        cations.add(titr.get(i).site().atom());
                        a.setImplicitHydrogenCount(h + 1);
                        a.setFormalCharge(q + 1);
                        z++;
                    } else if (!base && dep) {
                        if (h > 0) {
                            anions.add(titr.get(i).site().atom());
                            a.setImplicitHydrogenCount(h - 1);
                        } else {
                            IAtom o = copy.getBuilder().newInstance(IAtom.class, "O");
                            o.setImplicitHydrogenCount(1);
                            copy.addAtom(o);
                            copy.addBond(copy.indexOf(a), copy.indexOf(o), IBond.Order.SINGLE);
                        }
                        a.setFormalCharge(q - 1);
                        z--;
                    }
                }
                SpeciesForms.cancelRingPairs(copy, cations, anions); // [nH+]...[n-] in one ring is the neutral form
                String key = Overrides.canonical(copy);
                int at = -1;
                for (int j = 0; j < out.size(); j++) {
                    if (keys.get(j).equals(key)) {
                        at = j;
                    }
                }
                if (at >= 0) {
                    Species prior = out.get(at);
                    out.set(at, new Species(prior.smiles(), prior.charge(), prior.fraction() + m.fraction()));
                } else {
                    keys.add(key);
                    out.add(new Species(StructureReader.smiles(copy), z, m.fraction()));
                }
            } catch (CloneNotSupportedException e) {
                throw new IllegalStateException(e);
            }
        }
        out.sort((a, b) -> Double.compare(b.fraction(), a.fraction()));
        return out;
    }
}
