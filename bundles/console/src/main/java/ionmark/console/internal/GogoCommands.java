package ionmark.console.internal;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

import ionmark.acidity.api.TableService;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Speciation;

/** Quick checks in the framework console: {@code ionmark:check 'CC(=O)O' 7.4}, {@code ionmark:table}. */
@Component(service = GogoCommands.class, property = {"osgi.command.scope=ionmark", "osgi.command.function=check",
        "osgi.command.function=table"})
public final class GogoCommands {
    private final Speciation speciation;
    private final TableService tables;

    @Activate
    public GogoCommands(@Reference Speciation speciation, @Reference TableService tables) {
        this.speciation = speciation;
        this.tables = tables;
    }

    public String check(String structure) {
        return TextReport.of(speciation.analyse(structure, Conditions.noPh()));
    }

    public String check(String structure, double ph) {
        return TextReport.of(speciation.analyse(structure, Conditions.atPh(ph)));
    }

    public String table() {
        var t = tables.current();
        return "table " + t.version().label() + ": " + t.groups().size() + " group classes, " + t.substituents().size()
                + " substituents, " + t.measured().size() + " measured compounds";
    }
}
