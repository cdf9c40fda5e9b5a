/** Every SWR key of the app comes from here. */
export const swrKeys = {
  memoVersions: (memoId: number) => `/api/memos/${memoId}/versions`,
  memo: (memoId: number) => `/api/memos/${memoId}`,
  memoFigure: (memoId: number, figureId: string) => `/api/memos/${memoId}/figures/${encodeURIComponent(figureId)}`,
  memoRequirements: (memoId: number) => `/api/memos/${memoId}/requirements`,
  users: (role?: string) => (role ? `/api/users?role=${encodeURIComponent(role)}` : '/api/users'),
  memoCoAuthors: (memoId: number) => `/api/memos/${memoId}/co-authors`,
  memoComments: (memoId: number) => `/api/memos/${memoId}/comments`,
  notifications: () => '/api/notifications',
  notificationsRead: () => '/api/notifications/read',
  notificationSettings: () => '/api/me/notification-settings',
};
