package dev.mesolint.core.rules;

import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.AgreementStatus;
import dev.mesolint.core.model.EffortAgreement;
import dev.mesolint.core.model.OneRepMaxRelation;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.rule.Occurrences;
import dev.mesolint.core.rule.Rule;
import dev.mesolint.core.rule.RuleContext;
import dev.mesolint.core.rule.RuleMetadata;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import dev.mesolint.core.value.RirRange;
import dev.mesolint.core.value.Rpe;
import dev.mesolint.core.rule.RuleParameter;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The efforts a set states agree with each other: the load against the reps and reserve, and RIR against RPE.
 *
 * <p>Three severities: a load that cannot be lifted for the prescribed reps is an {@code error} (the set cannot be
 * done as written), unless it is an absolute load that a 1RM risen at a plausible rate since it was stated would
 * allow: then it is an {@code info}, 1RM out of date ({@link RisingOneRepMax}); every other disagreement takes the
 * rule's configured severity ({@code warning} by default). A profile that sets the rule {@code off} silences all.
 */
public final class EffortConflictRule implements Rule {
    public static final String ID = "effort-conflict";

    private static final RuleMetadata METADATA = new RuleMetadata(ID,
            "The efforts a set states agree: its load allows the prescribed reps (error if not; info, 1RM out of "
                    + "date, for an absolute load a plausible rise of the 1RM explains), and does not leave far more "
                    + "in reserve than stated; RIR and RPE agree.",
            Severity.WARNING, RuleMetadata.Category.EFFORT, parameters(),
            "A set that gives both a load and a reserve says the same thing twice, and the two must fit the "
                    + "published relation between %1RM and reps to failure (NSCA Table 17.7; Brzycki by default). A "
                    + "load that allows fewer reps than prescribed cannot be done as written and is an error, "
                    + "whatever severity the profile gives the rule (a profile can only turn the rule off), unless "
                    + "a risen 1RM explains it (below). A load "
                    + "that leaves far more reps in reserve than stated (mislabelled), a load that fits the reps but "
                    + "not the reserve, and RIR and RPE that disagree are reported at the rule's severity (warning). "
                    + "Reps at a given %1RM vary between people and exercises, and reserve estimates err by more than "
                    + "two reps far from failure, so the model's tolerance (effortToleranceReps, 2 reps) is allowed "
                    + "first. Ballistic and Olympic lifts are not read through the %1RM relation at all (a set of "
                    + "cleans ends at a technical miss, not at muscular failure); only their RIR and RPE are "
                    + "compared. Under the strength and general-fitness profiles, a strength-purpose set (at most 6 "
                    + "reps at 60% of 1RM or more) that leaves more in reserve than stated is not called "
                    + "mislabelled: heavy low-rep sets stay far from failure on purpose, and the stated reserve "
                    + "there is a ceiling on effort, not a target. " + RisingOneRepMax.RATIONALE,
            "Haff & Triplett 2016, NSCA Essentials 4th ed., Ch. 17, Table 17.7; Brzycki 1993; Zourdos et al. 2016, "
                    + "JSCR 30(1):267-275; Hackett et al. 2017, JSCR 31:2162-2168; " + RisingOneRepMax.SOURCE);

    private static List<RuleParameter> parameters() {
        List<RuleParameter> all = new ArrayList<>(StrengthSets.parameters());
        all.addAll(RisingOneRepMax.parameters());
        return List.copyOf(all);
    }

    @Override
    public RuleMetadata metadata() {
        return METADATA;
    }

    @Override
    public void check(RuleContext context) {
        if (!context.index().sets().effortConflict()) {
            return;
        }
        OneRepMaxRelation relation = context.metrics().parameters().oneRepMaxRelation();
        Occurrences.SetHits<Optional<RisingOneRepMax.Reading>> groups = new Occurrences.SetHits<>();
        OutOfDateOneRepMax outOfDate = new OutOfDateOneRepMax(context, relation);
        for (WeekMetrics week : context.metrics().weeks()) {
            for (SessionMetrics session : week.sessions()) {
                for (SetMetrics set : session.sets()) {
                    if (!set.agreement().isConflict() || notJudged(context, set)) {
                        continue;
                    }
                    String key = set.agreement().status() == AgreementStatus.RIR_RPE_DIFFER ? "rpe" : "load";
                    Location where = context.fieldLocation(set.prescription(), key);
                    Optional<RisingOneRepMax.Reading> reading = set.agreement().status() == AgreementStatus.INFEASIBLE
                            ? RisingOneRepMax.of(context, week.number(), session.day(), set, relation)
                            : Optional.empty();
                    if (reading.isPresent() && reading.get().plausible()) {
                        outOfDate.add(week, session, set, where, reading.get());
                        continue;
                    }
                    // A reading quotes figures of its week, so its hits group by week.
                    groups.add(week, session, set, where, List.of(set.agreement().status(),
                            EffortText.prescription(set.prescription()), reading.isPresent() ? week.number() : 0),
                            reading);
                }
            }
        }
        Occurrences found = new Occurrences();
        for (Occurrences.Group<Optional<RisingOneRepMax.Reading>> group : groups.groups()) {
            SetMetrics set = group.first();
            EffortAgreement agreement = set.agreement();
            Severity severity = agreement.status() == AgreementStatus.INFEASIBLE ? Severity.ERROR : context.severity();
            String risen = group.values().get(0).map(r -> "; " + OutOfDateOneRepMax.implausible(context, r, relation))
                    .orElse("");
            group.add(found, severity, group.label() + ": " + problem(set, relation) + risen,
                    fix(context, set, relation));
        }
        outOfDate.addTo(found);
        found.report(context);
    }

    /** Ballistic lifts: only RIR against RPE; strength-purpose sets where the profile says so: no mislabel. */
    private static boolean notJudged(RuleContext context, SetMetrics set) {
        AgreementStatus status = set.agreement().status();
        if (status == AgreementStatus.RIR_RPE_DIFFER) {
            return false;
        }
        if (StrengthSets.ballistic(context, set.exerciseId())) {
            return true;
        }
        return status == AgreementStatus.MISLABELLED && StrengthSets.notJudged(context, set);
    }

    private static String problem(SetMetrics set, OneRepMaxRelation relation) {
        SetPrescription p = set.prescription();
        EffortAgreement a = set.agreement();
        String written = EffortText.prescription(p);
        String allows = a.repsToFailure().isPresent()
                ? "that load allows about " + Texts.num(a.repsToFailure().getAsDouble()) + " reps to failure ("
                        + Relations.name(relation) + ")"
                : "";
        return switch (a.status()) {
            case INFEASIBLE -> written + " cannot be done: " + allows + ", fewer than the "
                    + p.reps().max() + " prescribed";
            case HARDER_THAN_STATED -> written + " ends nearer failure than written: " + allows + ", so "
                    + p.reps().max() + " reps leave about "
                    + Texts.num(Math.max(0, a.repsToFailure().getAsDouble() - p.reps().max())) + " in reserve, not "
                    + Texts.num(leastStated(p)) + " (tolerance " + Texts.num(a.tolerance()) + " reps)";
            case MISLABELLED -> written + " is mislabelled: " + allows + ", so the set leaves about "
                    + Texts.num(a.impliedRir().getAsDouble()) + " reps in reserve, not the "
                    + Texts.num(a.statedRir().getAsDouble()) + " stated (tolerance " + Texts.num(a.tolerance())
                    + " reps)";
            case RIR_RPE_DIFFER -> EffortText.stated(p) + " disagree: RPE " + p.rpe().orElseThrow() + " means "
                    + Texts.num(p.rpe().orElseThrow().repsInReserve()) + " reps in reserve on the RIR-based scale";
            case AGREE, NOT_CHECKED -> throw new IllegalStateException("not a conflict: " + a.status());
        };
    }

    private static String fix(RuleContext context, SetMetrics set, OneRepMaxRelation relation) {
        SetPrescription p = set.prescription();
        EffortAgreement a = set.agreement();
        double reserve = p.rir().isPresent() || p.rpe().isPresent() ? leastStated(p) : 0;
        return switch (a.status()) {
            case INFEASIBLE, HARDER_THAN_STATED -> {
                int reps = (int) Math.max(1, Math.floor(a.repsToFailure().getAsDouble() - reserve));
                String target = p.reps().max() + " reps"
                        + (reserve > 0 ? " at " + Texts.num(reserve) + " in reserve" : "");
                yield "load: " + loadAsWritten(set, relation, p.reps().max() + reserve) + " for " + target
                        + ", or reps: " + reps + " at this load";
            }
            case MISLABELLED -> heavier(context, set, relation)
                    ? "load: " + Relations.loadFor(relation, set.reps() + a.statedRir().getAsDouble())
                            + " to leave " + Texts.num(a.statedRir().getAsDouble()) + " in reserve, or rir: "
                            + Math.round(a.impliedRir().getAsDouble()) + " if the lighter load is meant"
                    : "write the reserve this load leaves, rir: " + Math.round(a.impliedRir().getAsDouble())
                            + " (the athlete's cap or a novice's limit on this lift keeps the load down)";
            case RIR_RPE_DIFFER -> "rpe: " + Texts.num(10 - p.rir().orElseThrow().midpoint()) + " to agree with rir: "
                    + p.rir().orElseThrow() + ", or state one of them and remove the other";
            case AGREE, NOT_CHECKED -> throw new IllegalStateException("not a conflict: " + a.status());
        };
    }

    /**
     * The load that allows {@code repsToFailure}, in the form the set writes its load: a share of 1RM in 2.5% steps, or
     * for a weight the same share of the 1RM in force in plate steps (2.5 kg, 5 lb), rounded down, so the fix can be
     * pasted over the value it replaces.
     */
    private static String loadAsWritten(SetMetrics set, OneRepMaxRelation relation, double repsToFailure) {
        if (set.prescription().load().orElse(null) instanceof Load.Absolute written
                && set.effort().loadFraction().isPresent() && set.effort().loadFraction().getAsDouble() > 0) {
            double oneRepMax = written.amount() / set.effort().loadFraction().getAsDouble();
            double step = written.unit() == LoadUnit.LB ? 5 : 2.5;
            double weight = Math.floor(Relations.shareFor(relation, repsToFailure) * oneRepMax / step + 1e-9) * step;
            if (weight >= step) {
                return new Load.Absolute(weight, written.unit()).toString();
            }
        }
        return Relations.loadFor(relation, repsToFailure);
    }

    /** True when the load the stated reserve asks for stays under the athlete's caps and a novice's limit. */
    private static boolean heavier(RuleContext context, SetMetrics set, OneRepMaxRelation relation) {
        double share = Relations.shareFor(relation, set.reps() + set.agreement().statedRir().getAsDouble());
        return !LoadCeilings.over(context, set.exerciseId(), Math.floor(share * 1000 / 25) * 2.5 / 100);
    }

    /** The least reserve the set states: its RIR's lower end, else its RPE read as RIR. */
    static double leastStated(SetPrescription p) {
        return p.rir().map(RirRange::min).orElseGet(() -> p.rpe().map(Rpe::repsInReserve).orElse(0.0));
    }
}
