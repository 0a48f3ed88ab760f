/**
 * The generator registry wired to Axisline's own acoustics library. Tests may build a
 * registry from stubs with `createGeneratorRegistry` instead.
 */
import * as acoustics from "@/lib/acoustics";
import { createGeneratorRegistry, type GeneratorRegistry } from "./generated";

export const acousticsGenerators: GeneratorRegistry = createGeneratorRegistry(acoustics);
