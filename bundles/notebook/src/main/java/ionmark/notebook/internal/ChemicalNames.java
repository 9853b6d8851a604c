package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.graph.ConnectivityChecker;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

import uk.ac.cam.ch.wwmm.opsin.NameToStructure;
import uk.ac.cam.ch.wwmm.opsin.OpsinResult;

/**
 * Chemical names in running text ("4-aminobenzoic acid", "2-(4-isobutylphenyl)propanoic acid",
 * "N-methylmorpholine"), turned into structures by OPSIN, conservatively:
 * <ul>
 * <li>a word is tried only when it looks like a name: a locant ("4-", "N-", "2,6-") before a name part, or a
 * lower-case word with a name ending ("-ine", "-ol", "-one", "… acid", an ester "ethyl …oate");</li>
 * <li>common solvents and reagents, elements, name fragments ("methyl", "benzoic") and words in capitals
 * ("THF", "DMSO") are never structures to annotate;</li>
 * <li>the structure must have carbon and at least three heavy atoms.</li>
 * </ul>
 * A word with a locant that OPSIN cannot read is returned with its reason, to be reported on the card rather
 * than guessed; a plain word that does not parse is ordinary text.
 */
final class ChemicalNames {
    /** A name found in the text: its structure (SMILES) or why it could not be read. */
    record Name(String words, int start, String smiles, String error) {
        boolean ok() {
            return smiles != null;
        }
    }

    private static final Pattern WORD = Pattern.compile("[^\\s]+");
    /** A locant before a name part: "4-amino", "N-methyl", "2,6-di", "(2S)-", "1H-indole", "4-(amino…". */
    private static final Pattern LOCANT = Pattern.compile("(?:^|[-(\\[,\\s])(?:\\d+[a-z]?['′]*(?:,\\d+[a-z]?['′]*)*|[NOS]"
            + "(?:,[NOS]'?)*|\\d+H|\\(\\d*[RSEZ](?:,\\d*[RSEZ])*\\))-[A-Za-z(\\[]");
    /** Morphemes of a systematic or semi-systematic name (a word with a locant needs one to be a name). */
    private static final Pattern MORPH = Pattern.compile("yl|amin|anil|benz|phen|pyr|fur|thi|ox|az|chlor|brom|fluor|iod"
            + "|nitr|hydr|meth|eth|prop|but|pent|hex|hept|oct|non|dec|cyclo|carb|sulf|phos|oic|ol$|one$|ine$|ane$|ene$"
            + "|ate$|ide$|ile$|ole$");
    /** Endings of a plain one-word name ("aniline", "phenol", "morpholine", "acetophenone"). */
    private static final Pattern ENDING = Pattern.compile("[a-z]{2,}(?:ine|ole|ol|one|ane|ene|amide|ile)");
    /** The ester or salt after a {@link #HEADS} word ("4-aminobenzoate"); a lone anion is a counter-ion, not read. */
    private static final Pattern ESTER = Pattern.compile("[a-z0-9,()\\[\\]'-]*[a-z]{3,}(?:ate|ite)");
    /** A second word that completes a name. */
    private static final Set<String> TAILS = Set.of("acid", "hydrochloride", "hydrobromide", "anhydride", "oxide");
    /** A first word that names the ester or salt of the next ("ethyl 4-aminobenzoate"). */
    private static final Set<String> HEADS = Set.of("methyl", "ethyl", "propyl", "isopropyl", "butyl", "tert-butyl",
            "benzyl", "phenyl", "allyl", "sodium", "potassium", "lithium");
    /** Solvents, work-up reagents and common acids and bases: named in every procedure, never the subject. */
    private static final Set<String> COMMON = Set.of("water", "methanol", "ethanol", "propanol", "isopropanol",
            "propan-2-ol", "2-propanol", "1-propanol", "butanol", "1-butanol", "tert-butanol", "acetone", "butanone",
            "acetonitrile", "toluene", "benzene", "xylene", "xylenes", "hexane", "hexanes", "heptane", "pentane",
            "cyclohexane", "dichloromethane", "chloroform", "1,2-dichloroethane", "dichloroethane", "tetrachloromethane",
            "ether", "diethyl ether", "tetrahydrofuran", "2-methyltetrahydrofuran", "dioxane", "1,4-dioxane",
            "dimethylformamide", "n,n-dimethylformamide", "dimethylacetamide", "n,n-dimethylacetamide", "dimethyl sulfoxide",
            "dimethylsulfoxide", "n-methylpyrrolidone", "n-methyl-2-pyrrolidone", "1-methyl-2-pyrrolidinone",
            "ethyl acetate", "methyl acetate", "isopropyl acetate", "methyl tert-butyl ether", "tert-butyl methyl ether",
            "chlorobenzene", "nitromethane", "glycerol", "ethylene glycol", "pyridine", "triethylamine",
            "diisopropylethylamine", "n,n-diisopropylethylamine", "methane", "ethane", "ethene", "ammonia", "urea",
            "acetic acid", "formic acid", "trifluoroacetic acid", "hydrochloric acid", "sulfuric acid", "nitric acid",
            "phosphoric acid", "hydrobromic acid", "hydrofluoric acid", "boric acid", "carbonic acid",
            "sodium hydroxide", "potassium hydroxide", "lithium hydroxide", "sodium bicarbonate", "sodium carbonate",
            "potassium carbonate", "sodium acetate", "ammonium acetate", "ammonium formate", "sodium formate",
            "sodium sulfate", "magnesium sulfate", "sodium chloride", "ammonium chloride", "sodium phosphate",
            "potassium phosphate", "sodium citrate", "citric acid", "ethanolamine", "methylamine", "dimethylamine",
            "trimethylamine", "ethylamine", "diethylamine");
    /** Words that end like names but are English (a guard in front of the name reader). */
    private static final Set<String> ENGLISH = Set.of("define", "decline", "machine", "routine", "discipline", "engine",
            "baseline", "online", "outline", "pipeline", "guideline", "combine", "determine", "examine", "medicine",
            "alone", "anyone", "everyone", "someone", "done", "gone", "none", "phone", "zone", "scone", "stone",
            "separate", "filtrate", "concentrate", "evaporate", "precipitate", "approximate", "adequate", "indicate",
            "estimate", "immediate", "moderate", "accurate", "duplicate", "triplicate", "aggregate", "isolate",
            "wide", "side", "guide", "provide", "decide", "inside", "outside", "aside", "beside", "slide", "override",
            "while", "mobile", "volatile", "profile", "file", "fragile", "sterile", "hostile", "textile", "pile",
            "whole", "role", "sole", "console", "control", "protocol", "patrol", "hole", "pole", "parole",
            "plane", "lane", "membrane", "scene", "gene", "polyethylene", "scheme", "glide", "ride");

    private static final int CACHE_LIMIT = 4096;
    private static final Map<String, OpsinOutcome> CACHE = new ConcurrentHashMap<>();

    private record OpsinOutcome(String smiles, String message) {
    }

    private ChemicalNames() {
    }

    /** Every name in the text, in text order, once per wording. */
    static List<Name> find(String text) {
        List<Name> out = new ArrayList<>();
        List<int[]> spans = new ArrayList<>();
        Matcher m = WORD.matcher(text);
        while (m.find()) {
            spans.add(trimmed(text, m.start(), m.end()));
        }
        for (int i = 0; i < spans.size(); i++) {
            int[] w = spans.get(i);
            if (w[1] <= w[0]) {
                continue;
            }
            String word = text.substring(w[0], w[1]);
            int[] next = i + 1 < spans.size() ? spans.get(i + 1) : null;
            String nextWord = next == null || next[1] <= next[0] ? "" : text.substring(next[0], next[1]);
            boolean adjacent = next != null && text.substring(w[1], next[0]).isBlank();
            String lowerNext = nextWord.toLowerCase(Locale.ROOT);
            String candidate = word;
            int end = w[1];
            if (adjacent && (TAILS.contains(lowerNext) || HEADS.contains(word.toLowerCase(Locale.ROOT))
                    && ESTER.matcher(lowerNext).matches())) {
                candidate = word + " " + nextWord;
                end = next[1];
                if (COMMON.contains(candidate.toLowerCase(Locale.ROOT))) {
                    i++; // "ethyl acetate", "acetic acid": neither word is a compound to annotate
                    continue;
                }
            }
            Name n = read(candidate, w[0]);
            if (n != null) {
                final String words = candidate;
                if (out.stream().noneMatch(x -> x.words().equalsIgnoreCase(words))) {
                    out.add(n);
                }
                if (end != w[1]) {
                    i++; // the second word belongs to this name
                }
            }
        }
        return out;
    }

    /** The word without surrounding punctuation and unbalanced brackets. */
    private static int[] trimmed(String text, int start, int end) {
        while (end > start && ".,;:!?\"”’".indexOf(text.charAt(end - 1)) >= 0) {
            end--;
        }
        while (start < end && "\"“‘".indexOf(text.charAt(start)) >= 0) {
            start++;
        }
        boolean changed = true;
        while (changed && end > start) {
            changed = false;
            String s = text.substring(start, end);
            int open = count(s, '(') + count(s, '[');
            int close = count(s, ')') + count(s, ']');
            if (close > open && (s.endsWith(")") || s.endsWith("]"))) {
                end--;
                changed = true;
            } else if (open > close && (s.startsWith("(") || s.startsWith("["))) {
                start++;
                changed = true;
            }
            while (end > start && ".,;:".indexOf(text.charAt(end - 1)) >= 0) {
                end--;
                changed = true;
            }
        }
        return new int[] {start, end};
    }

    private static int count(String s, char c) {
        return (int) s.chars().filter(x -> x == c).count();
    }

    /** The name read, or null where the words are not a name to annotate. */
    static Name read(String words, int start) {
        String lower = words.toLowerCase(Locale.ROOT);
        if (lower.length() < 5 || COMMON.contains(lower) || ENGLISH.contains(lower) || words.matches(".*[=#@$%/\\\\].*")
                || words.matches(".*[A-Za-z]\\d.*") || !words.matches(".*[a-z]{3}.*")
                || words.matches("[A-Z]{2}.*") && !words.matches("[NOS],[NOS].*")) {
            return null; // a solvent or reagent, a SMILES, a word in capitals
        }
        boolean locant = LOCANT.matcher(words).find() && MORPH.matcher(lower.replaceAll("[^a-z]", " ")).find();
        boolean capitalised = Character.isUpperCase(words.charAt(0)) && !locant;
        String plain = capitalised ? lower : words;
        if (!locant && !(plain.matches("[a-z]+(?: [a-z]+)?") && (ENDING.matcher(plain).matches()
                || plain.endsWith(" acid") || plain.contains(" ") && ESTER.matcher(plain.split(" ")[1]).matches())
                && !ENGLISH.contains(plain.split(" ")[0]))) {
            return null;
        }
        OpsinOutcome o = opsin(locant ? words : plain);
        if (o.smiles() != null && organic(o.smiles())) {
            return new Name(words, start, o.smiles(), null);
        }
        if (locant && o.smiles() == null) {
            return new Name(words, start, null, "the name '" + words + "' could not be turned into a structure ("
                    + o.message() + "). Check the spelling and the locants, or give the structure as SMILES or a "
                    + "molfile; Ionmark does not guess.");
        }
        return null; // ordinary text, or a name without carbon (an element, a salt)
    }

    /**
     * A structure field (a structure block, the quick check) that holds a chemical name instead of a SMILES or
     * molfile: one line that is not a SMILES CDK can read. The whole text is the name; no filter applies, since the
     * chemist put it where a structure goes. Null when the text is not such a line; a name OPSIN cannot read comes
     * back with its reason.
     */
    static Name whole(String text) {
        String t = text.strip();
        if (t.isEmpty() || t.contains("\n") || !t.matches(".*[a-z]{3}.*") || NamedOnce.unique(t) != null) {
            return null;
        }
        OpsinOutcome o = opsin(t);
        return o.smiles() != null ? new Name(t, -1, o.smiles(), null) : new Name(t, -1, null, "'" + t + "' is neither a "
                + "SMILES nor a chemical name that can be turned into a structure (" + o.message() + "). Check the "
                + "spelling, or give the structure as SMILES or a molfile; Ionmark does not guess.");
    }

    /** Carbon and at least three heavy atoms in the largest component. */
    private static boolean organic(String smiles) {
        try {
            IAtomContainer mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(smiles);
            IAtomContainer largest = null;
            for (IAtomContainer part : ConnectivityChecker.partitionIntoMolecules(mol).atomContainers()) {
                if (largest == null || part.getAtomCount() > largest.getAtomCount()) {
                    largest = part;
                }
            }
            int carbon = 0;
            int heavy = 0;
            for (IAtom a : largest.atoms()) {
                heavy += a.getAtomicNumber() > 1 ? 1 : 0;
                carbon += a.getAtomicNumber() == 6 ? 1 : 0;
            }
            return carbon > 0 && heavy >= 3;
        } catch (InvalidSmilesException | RuntimeException e) {
            return false; // OPSIN wrote something CDK cannot read: not annotated
        }
    }

    /** True when two SMILES are the same structure (CDK's unique SMILES); false when either does not parse. */
    static boolean same(String a, String b) {
        String u = NamedOnce.unique(a);
        return u != null && u.equals(NamedOnce.unique(b));
    }

    private static OpsinOutcome opsin(String name) {
        OpsinOutcome cached = CACHE.get(name);
        if (cached != null) {
            return cached;
        }
        OpsinResult r = NameToStructure.getInstance().parseChemicalName(name);
        String smiles = r.getStatus() == OpsinResult.OPSIN_RESULT_STATUS.FAILURE ? null : r.getSmiles();
        String message = r.getMessage() == null || r.getMessage().isBlank() ? "not a name the reader knows"
                : r.getMessage();
        OpsinOutcome o = new OpsinOutcome(smiles, message);
        if (CACHE.size() >= CACHE_LIMIT) {
            CACHE.clear();
        }
        CACHE.put(name, o);
        return o;
    }
}
