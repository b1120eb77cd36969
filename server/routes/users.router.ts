import { Router } from "express";
import { createUserInput, resetPasswordInput, updateUserInput, userIdParams } from "../../shared/api/users.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { actorOf } from "../auth/current-user.ts";
import type { UserService } from "../services/user.service.ts";

export function createUsersRouter(users: UserService, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/users", table);

  routes.get("/", "users.read", async (_req, res) => {
    res.json({ users: await users.list() });
  });

  routes.post("/", "users.write", async (req, res) => {
    const input = parseInput(createUserInput, req.body, "body");
    res.status(201).json({ user: await users.create(actorOf(req), input) });
  });

  routes.patch("/:id", "users.write", async (req, res) => {
    const { id } = parseInput(userIdParams, req.params, "params");
    const input = parseInput(updateUserInput, req.body, "body");
    res.json({ user: await users.update(actorOf(req), id, input) });
  });

  routes.post("/:id/password", "users.write", async (req, res) => {
    const { id } = parseInput(userIdParams, req.params, "params");
    const { password } = parseInput(resetPasswordInput, req.body, "body");
    await users.resetPassword(actorOf(req), id, password);
    res.status(204).end();
  });

  return router;
}
