package org.rosetra.lang.plan;

import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.strain.StrainState;
import org.rosetra.runtime.stress.PlaneCondition;
import org.rosetra.runtime.stress.StressState;

/**
 * A strain or stress state given directly. With a material both states are known; without one
 * only the state that was given ({@code strain} or {@code stress} is then null).
 */
public record StateModel(String name, StrainState strain, StressState stress, Material material,
                         PlaneCondition condition) {}
