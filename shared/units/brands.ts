import type { z } from 'zod';
import type { DEFS, Quantity } from './definitions';
import { toShown, toStored } from './registry';

/*
 * Branded numbers: a value carries its unit in its type, so an IP number or a bare number cannot stand where
 * an SI value is required (D-014, D-028). The engines' zod schemas brand their inputs (`.brand<'m'>()`), so
 * what a schema parses is SI by type (`…InputSI`); the engines' own types (`…Input`) are the same shapes
 * with those brands taken off (`Unbranded`), so the hot loops and the literals of examples and tests stay plain
 * numbers. A number crosses from IP to SI only through `toSI`.
 */

/** A number that carries its unit in its type — zod's brand, so a `.brand<'m'>()` schema yields a `Metre`. */
export type Brand<T, B extends string> = T & z.$brand<B>;

type SiSymbol<Q extends Quantity> = Q extends 'psi' ? 'ψ W/(m·K)' : (typeof DEFS)[Q]['si'];
/** A quantity's value in its stored SI unit (the registry's `si`): `SI<'length'>` is a `Metre`. */
export type SI<Q extends Quantity> = Brand<number, SiSymbol<Q>>;
/** A quantity's value in its IP unit (the registry's `IP`: ft for `length`, in for `shortLength`, °F, psf, …). */
export type IP<Q extends Quantity> = Brand<number, `${Q} in IP units`>;

/** A value already in SI, with its unit stated where no schema parsed it (a fixture, a template, a form's default). */
export const siValue = <B extends string>(v: number): Brand<number, B> => v as Brand<number, B>;
/** A number typed or read in a quantity's IP unit. */
export const ipValue = <Q extends Quantity>(_q: Q, v: number): IP<Q> => v as IP<Q>;
/** An IP value → SI (the registry's factor and origin): the one way from IP to an SI brand. */
export const toSI = <Q extends Quantity>(q: Q, v: IP<Q>): SI<Q> => toStored(v, q, 'IP') as SI<Q>;
/** An SI value → its IP unit. */
export const toIP = <Q extends Quantity>(q: Q, v: SI<Q>): IP<Q> => toShown(v, q, 'IP') as IP<Q>;

/** The SI brands the engines' schemas put on their inputs (χ and ψ keep theirs in the engine types too). */
type EngineSymbol = SiSymbol<Exclude<Quantity, 'psi' | 'chi'>>;
type EngineBrand = { [S in EngineSymbol]: z.$brand<S> }[EngineSymbol];

/** A parsed (branded) input as the engine takes it: the SI brands of `EngineSymbol` off, everything else kept. */
export type Unbranded<T> = T extends number
  ? T extends EngineBrand
    ? number
    : T
  : T extends readonly unknown[]
    ? { [K in keyof T]: Unbranded<T[K]> }
    : T extends object
      ? { [K in keyof T]: Unbranded<T[K]> }
      : T;
