import { NextResponse } from 'next/server';
import { withActor, parseJsonBody, parseWith, searchParamsObject } from '@/lib/api/route-handler';
import { assertGlobal } from '@/lib/auth/permissions';
import { listUsers } from '@/lib/users/list-users';
import { createUser } from '@/lib/users/create-user';
import { createUserInputSchema, listUsersQuerySchema } from '@/lib/users/user-schema';

export const dynamic = 'force-dynamic';

export const GET = withActor(async ({ req, actor }) => {
  const query = parseWith(listUsersQuerySchema, searchParamsObject(req));
  return { users: await listUsers(actor, query) };
});

export const POST = withActor(async ({ req, actor }) => {
  assertGlobal(actor, 'user.manage');
  const input = await parseJsonBody(req, createUserInputSchema);
  return NextResponse.json(await createUser(input, actor), { status: 201 });
});
