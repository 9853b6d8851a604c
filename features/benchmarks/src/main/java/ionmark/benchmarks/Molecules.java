package ionmark.benchmarks;

import java.util.List;

/** Drug-like molecules (well-known drugs, structures as commonly drawn). */
final class Molecules {
    static final List<String> DRUG_LIKE = List.of(
            "CC(C)Cc1ccc(cc1)C(C)C(=O)O", "OC(=O)Cc1ccccc1Nc1c(Cl)cccc1Cl", "CN(C)CCOC(c1ccccc1)c1ccccc1",
            "CC(C)NCC(O)COc1cccc2ccccc12", "CN1CCC[C@H]1c1cccnc1", "CCN(CC)CC(=O)Nc1c(C)cccc1C",
            "CC(=O)Nc1ccc(O)cc1", "Cn1cnc2c1c(=O)n(C)c(=O)n2C", "CN(C)C(=N)NC(N)=N", "CC(=O)Oc1ccccc1C(=O)O",
            "COc1ccc2cc(ccc2c1)C(C)C(=O)O", "CN(C)CCCN1c2ccccc2CCc2ccccc21", "CC(C)NCC(O)COc1ccc(CC(N)=O)cc1",
            "Nc1ccc(cc1)S(=O)(=O)Nc1ncccn1", "CCCCNC(=O)NS(=O)(=O)c1ccc(C)cc1", "CC(=O)CC(c1ccccc1)c1c(O)c2ccccc2oc1=O",
            "CCN(CC)CCOC(=O)c1ccc(N)cc1", "CN1CCN(CC1)c1ccc(cc1)C(=O)O", "NC(CCCNC(N)=N)C(=O)O",
            "OC(=O)CC(O)(CC(=O)O)C(=O)O");

    private Molecules() {
    }
}
