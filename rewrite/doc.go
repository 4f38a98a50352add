// Package rewrite decides what to give up when a parsed query finds
// nothing. It reads the constraints of a [parser.Result] and their
// strictness; it never touches a hard constraint.
//
// For now it holds the order in which constraints are relaxed
// ([RelaxOrder]); the strictness policy per category, the relaxation
// planner and the engine adapters build on it.
package rewrite
