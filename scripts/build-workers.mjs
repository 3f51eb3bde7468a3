// Placeholder replaced by the optimizer's worker build.
